import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { TreeDetailsForm } from "@/components/trees/tree-details-form";
import { TreeOutline } from "@/components/trees/tree-outline";
import { VersionBadge } from "@/components/trees/status-badge";
import { StartDraftForm } from "@/components/trees/version-forms";
import { VersionTable } from "@/components/trees/version-table";
import { EvidenceSuggestions } from "@/components/review/evidence-suggestions";
import { EmptyState } from "@/components/ui/empty-state";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { may } from "@/lib/auth/roles";
import { parseId } from "@/lib/trees/access";
import { loadGraph } from "@/lib/trees/graph";
import { draftOf, draftProblemCounts, familyChoices, latestPublishedOf, treeDetail } from "@/lib/trees/queries";

export const metadata: Metadata = { title: "Symptom tree" };

export default async function TreePage({ params, searchParams }: {
  params: Promise<{ id: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const { id } = await params;
  const user = await requireRole("tree:read", `/trees/${id}`);
  const treeId = parseId(id);
  const detail = treeId ? await treeDetail(treeId) : null;
  if (!detail) notFound();
  const editor = may(user.role, "tree:edit");
  const published = latestPublishedOf(detail);
  const draft = editor ? draftOf(detail) : null;
  if (!editor && !published) notFound();
  const [graph, families, problems] = await Promise.all([
    published ? loadGraph(published.id) : null,
    editor ? familyChoices() : [],
    draft ? draftProblemCounts([draft.id]) : new Map<number, number>(),
  ]);
  const justPublished = (await searchParams).published;
  const versions = editor ? detail.versions : detail.versions.filter((v) => v.state === "published");

  return (
    <div className="flex flex-col gap-6">
      <div>
        <p className="text-sm"><Link href="/trees">Trees</Link></p>
        <h1>{detail.symptom}</h1>
        <p className="text-ink-soft">{detail.title}</p>
        {detail.description ? <p className="mt-1 max-w-3xl text-sm text-ink-soft">{detail.description}</p> : null}
        <p className="mt-2 flex flex-wrap items-center gap-2 text-sm">
          <span className="text-ink-faint">Motor families:</span> {detail.scope.length ? detail.scope.map((s) => s.label).join(", ") : "all"}
          {published ? <VersionBadge state="published" number={published.number} /> : null}
          {draft ? <VersionBadge state="draft" number={draft.number} /> : null}
        </p>
      </div>
      {justPublished ? <p role="status" className="rounded-md border border-moss/40 bg-moss-light px-3 py-2 text-sm text-moss">Version {String(justPublished)} is published. New cases use it from now on; cases already walked keep the version they used.</p> : null}
      {editor ? (
        <Panel title="Editing">
          {draft ? (
            <div className="flex flex-wrap items-center gap-4">
              <Link href={`/trees/${detail.id}/edit`} className="rounded-md bg-copper px-4 py-2 font-medium text-white no-underline hover:bg-copper-dark hover:no-underline">Open draft {draft.number} in the editor</Link>
              <span className="text-sm text-ink-soft">{problems.get(draft.id) ? `${problems.get(draft.id)} problem(s) to fix before publishing.` : "No problems: ready to publish."}</span>
            </div>
          ) : (
            <div className="flex flex-wrap items-center gap-4">
              <StartDraftForm treeId={detail.id} fromNumber={published?.number ?? null} />
              <Link href={`/trees/${detail.id}/edit`} className="text-sm">View the published version on the canvas</Link>
            </div>
          )}
          <details className="mt-4">
            <summary className="cursor-pointer text-sm font-medium">Tree details and motor families</summary>
            <div className="mt-3 max-w-2xl">
              <TreeDetailsForm tree={{ id: detail.id, symptom: detail.symptom, title: detail.title, description: detail.description, scope: detail.scope.map((s) => s.slug) }} families={families} />
            </div>
          </details>
        </Panel>
      ) : null}
      <Panel title="Versions" actions={<Link href={`/trees/${detail.id}/versions`} className="text-sm">History and changes</Link>}>
        <VersionTable treeId={detail.id} versions={versions} />
      </Panel>
      <Panel title={published ? `Version ${published.number}, as published` : "Not published yet"}>
        {graph ? <TreeOutline graph={graph} /> : <EmptyState title="No published version yet.">Publish the draft to make it available for triage.</EmptyState>}
      </Panel>
      {published ? <EvidenceSuggestions treeId={detail.id} /> : null}
    </div>
  );
}
