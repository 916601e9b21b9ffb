import "server-only";
import { and, asc, desc, eq, ilike, inArray, or, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db, type Db, type Tx } from "@/db";
import { motorFamilies, motorMakers, trees, treeScope, treeVersions, users } from "@/db/schema";
import { causeOptions } from "@/lib/catalogue/queries";
import { loadGraph } from "./graph";
import { treeProblems } from "./problems";

export type TreeStatus = "draft" | "published" | "both";

export interface TreeListRow {
  id: number;
  slug: string;
  symptom: string;
  title: string;
  scope: { slug: string; label: string }[];
  status: TreeStatus | "empty";
  latestNumber: number | null;
  latestState: "draft" | "published" | null;
  lastEditor: string | null;
  editedAt: Date | null;
  draftVersionId: number | null;
  publishedNumber: number | null;
  /** Open validation problems of the draft; a published version has none by construction. */
  problems: number;
}

export interface TreeListFilter {
  q?: string;
  status?: TreeStatus | "all";
  family?: string;
}

const familyLabel = (f: { name: string; generation: string }) => `${f.name}${f.generation ? ` ${f.generation}` : ""}`;

async function scopesOf(treeIds: number[], conn: Db | Tx = db) {
  const rows = treeIds.length
    ? await conn
        .select({ treeId: treeScope.treeId, slug: motorFamilies.slug, name: motorFamilies.name, generation: motorFamilies.generation })
        .from(treeScope)
        .innerJoin(motorFamilies, eq(motorFamilies.id, treeScope.familyId))
        .where(inArray(treeScope.treeId, treeIds))
        .orderBy(asc(motorFamilies.name), asc(motorFamilies.generation))
    : [];
  const out = new Map<number, { slug: string; label: string }[]>();
  for (const r of rows) out.set(r.treeId, [...(out.get(r.treeId) ?? []), { slug: r.slug, label: familyLabel(r) }]);
  return out;
}

/** Open problems of each draft, by version id (drafts are few, so each is validated as it stands). */
export async function draftProblemCounts(versionIds: number[]): Promise<Map<number, number>> {
  const out = new Map<number, number>();
  if (!versionIds.length) return out;
  const catalogue = await causeOptions();
  for (const id of versionIds) {
    const graph = await loadGraph(id);
    if (graph) out.set(id, treeProblems(graph, catalogue).length);
  }
  return out;
}

export async function listTrees(filter: TreeListFilter = {}): Promise<TreeListRow[]> {
  const where = [eq(trees.archived, false)];
  const q = filter.q?.trim();
  if (q) {
    const like = `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    where.push(or(ilike(trees.symptom, like), ilike(trees.title, like), ilike(trees.slug, like))!);
  }
  if (filter.family) {
    // A tree with no scope applies to every family.
    where.push(sql`(not exists (select 1 from ${treeScope} s where s.tree_id = ${trees.id})
      or exists (select 1 from ${treeScope} s join ${motorFamilies} f on f.id = s.family_id where s.tree_id = ${trees.id} and f.slug = ${filter.family}))`);
  }
  const treeRows = await db.select().from(trees).where(and(...where)).orderBy(asc(trees.symptom));
  const ids = treeRows.map((t) => t.id);
  const editor = alias(users, "editor");
  const versionRows = ids.length
    ? await db
        .select({ id: treeVersions.id, treeId: treeVersions.treeId, number: treeVersions.number, state: treeVersions.state, editedAt: treeVersions.editedAt, editor: editor.name })
        .from(treeVersions)
        .leftJoin(editor, eq(editor.id, treeVersions.editedBy))
        .where(inArray(treeVersions.treeId, ids))
        .orderBy(desc(treeVersions.number))
    : [];
  const scopes = await scopesOf(ids);
  const drafts = versionRows.filter((v) => v.state === "draft");
  const problems = await draftProblemCounts(drafts.map((d) => d.id));

  const rows = treeRows.map((t): TreeListRow => {
    const versions = versionRows.filter((v) => v.treeId === t.id);
    const latest = versions[0];
    const draft = versions.find((v) => v.state === "draft");
    const published = versions.find((v) => v.state === "published");
    return {
      id: t.id, slug: t.slug, symptom: t.symptom, title: t.title, scope: scopes.get(t.id) ?? [],
      status: draft && published ? "both" : draft ? "draft" : published ? "published" : "empty",
      latestNumber: latest?.number ?? null, latestState: latest?.state ?? null, lastEditor: latest?.editor ?? null,
      editedAt: latest?.editedAt ?? null, draftVersionId: draft?.id ?? null, publishedNumber: published?.number ?? null, problems: draft ? problems.get(draft.id) ?? 0 : 0,
    };
  });
  const status = filter.status ?? "all";
  if (status === "all") return rows;
  // "draft" lists trees that have a draft, "published" those with a published version, "both" those with both.
  return rows.filter((r) =>
    status === "both" ? r.status === "both" : status === "draft" ? r.status === "draft" || r.status === "both" : r.status === "published" || r.status === "both",
  );
}

/** What a reader (no tree:edit) is shown of a row: the published side only. */
export function readerView(row: TreeListRow): TreeListRow {
  return {
    ...row, status: row.publishedNumber === null ? "empty" : "published", latestNumber: row.publishedNumber,
    latestState: row.publishedNumber === null ? null : "published", lastEditor: null, editedAt: null, draftVersionId: null, problems: 0,
  };
}

export interface VersionRow {
  id: number;
  number: number;
  state: "draft" | "published";
  revision: number;
  basedOnVersionId: number | null;
  note: string;
  editedAt: Date;
  editedBy: string | null;
  publishedAt: Date | null;
  publishedBy: string | null;
}

export async function listVersions(treeId: number, conn: Db | Tx = db): Promise<VersionRow[]> {
  const editor = alias(users, "editor");
  const publisher = alias(users, "publisher");
  return conn
    .select({
      id: treeVersions.id, number: treeVersions.number, state: treeVersions.state, revision: treeVersions.revision,
      basedOnVersionId: treeVersions.basedOnVersionId, note: treeVersions.note, editedAt: treeVersions.editedAt,
      editedBy: editor.name, publishedAt: treeVersions.publishedAt, publishedBy: publisher.name,
    })
    .from(treeVersions)
    .leftJoin(editor, eq(editor.id, treeVersions.editedBy))
    .leftJoin(publisher, eq(publisher.id, treeVersions.publishedBy))
    .where(eq(treeVersions.treeId, treeId))
    .orderBy(desc(treeVersions.number));
}

export interface TreeDetail {
  id: number;
  slug: string;
  symptom: string;
  title: string;
  description: string;
  scope: { slug: string; label: string }[];
  createdAt: Date;
  versions: VersionRow[];
}

export async function treeDetail(treeId: number, conn: Db | Tx = db): Promise<TreeDetail | null> {
  const [tree] = await conn.select().from(trees).where(eq(trees.id, treeId)).limit(1);
  if (!tree) return null;
  const [scopes, versions] = await Promise.all([scopesOf([tree.id], conn), listVersions(tree.id, conn)]);
  return {
    id: tree.id, slug: tree.slug, symptom: tree.symptom, title: tree.title, description: tree.description,
    scope: scopes.get(tree.id) ?? [], createdAt: tree.createdAt, versions,
  };
}

export const draftOf = (detail: TreeDetail) => detail.versions.find((v) => v.state === "draft") ?? null;
export const latestPublishedOf = (detail: TreeDetail) => detail.versions.find((v) => v.state === "published") ?? null;

/** Families for scope pickers, labelled with their maker. */
export async function familyChoices() {
  const rows = await db
    .select({ slug: motorFamilies.slug, name: motorFamilies.name, generation: motorFamilies.generation, maker: motorMakers.name })
    .from(motorFamilies)
    .innerJoin(motorMakers, eq(motorMakers.id, motorFamilies.makerId))
    .orderBy(asc(motorMakers.name), asc(motorFamilies.name), asc(motorFamilies.generation));
  return rows.map((r) => ({ slug: r.slug, label: `${familyLabel(r)} (${r.maker})` }));
}

/** For the senior's home: trees with a draft, with how many problems each draft has. */
export async function treesNeedingWork(limit = 8) {
  const rows = (await listTrees({ status: "draft" })).filter((r) => r.draftVersionId !== null);
  return rows.sort((a, b) => b.problems - a.problems || (b.editedAt?.getTime() ?? 0) - (a.editedAt?.getTime() ?? 0)).slice(0, limit);
}
