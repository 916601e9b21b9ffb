import type { Metadata } from "next";
import { ImportTreeForm } from "@/components/trees/import-form";
import { NewTreeForm } from "@/components/trees/new-tree-form";
import { TreeFilters } from "@/components/trees/tree-filters";
import { TreeTable } from "@/components/trees/tree-table";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { may } from "@/lib/auth/roles";
import { familyChoices, listTrees, readerView, type TreeListFilter } from "@/lib/trees/queries";

export const metadata: Metadata = { title: "Symptom trees" };

const STATUSES = ["all", "draft", "published", "both"] as const;
const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v) ?? "";

export default async function TreesPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireRole("tree:read", "/trees");
  const params = await searchParams;
  const q = one(params.q).slice(0, 100);
  const status = (STATUSES as readonly string[]).includes(one(params.status)) ? (one(params.status) as TreeListFilter["status"]) : "all";
  const family = one(params.family).slice(0, 80);
  const editor = may(user.role, "tree:edit");
  // Readers see trees with a published version only; drafts are the editors' business.
  const effective = editor ? status : status === "all" || status === "draft" ? "published" : status;
  const [rows, families] = await Promise.all([listTrees({ q, status: effective, family }), familyChoices()]);
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1>Symptom trees</h1>
        <p className="text-ink-soft">Each tree starts from one reported symptom and leads, answer by answer, to the likely causes.</p>
      </div>
      <Panel>
        <TreeFilters q={q} status={status ?? "all"} family={family} families={families} />
      </Panel>
      <Panel title={`${rows.length} tree${rows.length === 1 ? "" : "s"}`}>
        <TreeTable rows={editor ? rows : rows.map(readerView)} filtered={!!(q || family || status !== "all")} />
      </Panel>
      {editor ? (
        <div className="grid gap-6 lg:grid-cols-2">
          <Panel title="Start a tree from nothing"><NewTreeForm families={families} /></Panel>
          <Panel title="Import a tree file"><ImportTreeForm /></Panel>
        </div>
      ) : null}
    </div>
  );
}
