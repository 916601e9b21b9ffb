import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { DiffView } from "@/components/trees/diff-view";
import { VersionTable } from "@/components/trees/version-table";
import { EmptyState } from "@/components/ui/empty-state";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { may } from "@/lib/auth/roles";
import { causeOptions } from "@/lib/catalogue/queries";
import { parseId } from "@/lib/trees/access";
import { diffGraphs } from "@/lib/trees/diff";
import { emptyDraft } from "@/lib/trees/draft";
import { loadGraph } from "@/lib/trees/graph";
import { treeDetail } from "@/lib/trees/queries";

export const metadata: Metadata = { title: "Tree versions" };

const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

export default async function TreeVersionsPage({ params, searchParams }: {
  params: Promise<{ id: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const { id } = await params;
  const user = await requireRole("tree:read", `/trees/${id}/versions`);
  const treeId = parseId(id);
  const detail = treeId ? await treeDetail(treeId) : null;
  if (!detail) notFound();
  const versions = may(user.role, "tree:edit") ? detail.versions : detail.versions.filter((v) => v.state === "published");
  if (versions.length === 0) notFound();
  const query = await searchParams;
  const to = versions.find((v) => v.number === Number(one(query.to))) ?? versions[0];
  const from = versions.find((v) => v.number === Number(one(query.from))) ?? versions.find((v) => v.number < to.number) ?? null;
  const [before, after, catalogue] = await Promise.all([from ? loadGraph(from.id) : null, loadGraph(to.id), causeOptions()]);
  const diff = diffGraphs(before ?? emptyDraft(), after!);
  const titles = new Map([...(before?.nodes ?? []), ...after!.nodes].map((n) => [n.key, n.title || n.key]));
  const causes = new Map(catalogue.map((c) => [c.slug, c.name]));
  const select = "rounded-md border border-ink-faint/50 bg-white px-2 py-1.5";

  return (
    <div className="flex flex-col gap-6">
      <div>
        <p className="text-sm"><Link href="/trees">Trees</Link> / <Link href={`/trees/${detail.id}`}>{detail.symptom}</Link></p>
        <h1>Versions of “{detail.symptom}”</h1>
      </div>
      <Panel title="Compare two versions">
        <form method="get" className="mb-4 flex flex-wrap items-end gap-3 text-sm">
          <label className="flex flex-col gap-1 font-medium text-ink-soft">From
            <select name="from" defaultValue={from?.number ?? ""} className={select}>
              {versions.map((v) => <option key={v.id} value={v.number}>v{v.number} ({v.state})</option>)}
            </select>
          </label>
          <label className="flex flex-col gap-1 font-medium text-ink-soft">To
            <select name="to" defaultValue={to.number} className={select}>
              {versions.map((v) => <option key={v.id} value={v.number}>v{v.number} ({v.state})</option>)}
            </select>
          </label>
          <button type="submit" className="rounded-md border border-ink-soft px-3 py-1.5 font-medium hover:bg-paper-deep">Compare</button>
        </form>
        <p className="mb-3 text-sm text-ink-soft">{from ? `What changed from version ${from.number} to version ${to.number}:` : `Version ${to.number} is the first; everything in it is new.`}</p>
        {from && from.number === to.number ? <EmptyState title="Pick two different versions." /> :
          <DiffView diff={diff} titleOf={(k) => titles.get(k) ?? k} causeOf={(s) => causes.get(s) ?? s} />}
      </Panel>
      <Panel title="All versions"><VersionTable treeId={detail.id} versions={versions} /></Panel>
    </div>
  );
}
