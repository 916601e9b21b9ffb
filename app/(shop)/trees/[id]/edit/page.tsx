import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { EditorLoader } from "@/components/trees/editor/editor-loader";
import { DiscardDraftForm, StartDraftForm } from "@/components/trees/version-forms";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { currentSession } from "@/lib/auth/session";
import { causeOptions } from "@/lib/catalogue/queries";
import { parseId } from "@/lib/trees/access";
import { graphToDraft } from "@/lib/trees/draft";
import { loadGraph } from "@/lib/trees/graph";
import { draftOf, latestPublishedOf, treeDetail } from "@/lib/trees/queries";

export const metadata: Metadata = { title: "Tree editor" };

export default async function EditTreePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  await requireRole("tree:edit", `/trees/${id}/edit`);
  const treeId = parseId(id);
  const detail = treeId ? await treeDetail(treeId) : null;
  if (!detail) notFound();
  const draft = draftOf(detail);
  const published = latestPublishedOf(detail);
  const shown = draft ?? published;
  const [graph, catalogue, session] = await Promise.all([shown ? loadGraph(shown.id) : null, causeOptions(), currentSession()]);

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <p className="text-sm"><Link href="/trees">Trees</Link> / <Link href={`/trees/${detail.id}`}>{detail.symptom}</Link></p>
          <h1>{draft ? `Editing draft ${draft.number}` : "No draft open"}: {detail.title}</h1>
        </div>
        <div className="flex items-center gap-4 text-sm">
          <Link href={`/trees/${detail.id}/versions`}>Version history</Link>
          {draft ? <DiscardDraftForm versionId={draft.id} number={draft.number} onlyVersion={detail.versions.length === 1} /> : null}
        </div>
      </div>
      {!draft ? (
        <Panel>
          <p className="mb-3 text-sm text-ink-soft">
            {published ? `Version ${published.number} is published and frozen: cases walked on it keep it exactly as it is. Changes go into a new draft, copied from it.` : "This tree has no versions."}
          </p>
          <StartDraftForm treeId={detail.id} fromNumber={published?.number ?? null} />
        </Panel>
      ) : null}
      {shown && graph ? (
        <EditorLoader
          key={`${shown.id}:${shown.revision}`}
          tree={{ id: detail.id, slug: detail.slug, symptom: detail.symptom, title: detail.title, description: detail.description, scope: detail.scope.map((s) => s.slug) }}
          version={{ id: shown.id, number: shown.number, state: shown.state, revision: shown.revision, editedAt: shown.editedAt.toISOString(), editedBy: shown.editedBy }}
          graph={graphToDraft(graph)}
          catalogue={catalogue}
          readOnly={!draft}
          theme={session?.theme ?? "light"}
        />
      ) : null}
    </div>
  );
}
