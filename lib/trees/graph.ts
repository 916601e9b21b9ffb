import "server-only";
import { asc, eq, inArray } from "drizzle-orm";
import { db, type Db, type Tx } from "@/db";
import { causes, optionEvidence, treeCauses, treeNodes, treeOptions, treeVersions } from "@/db/schema";
import { AppError } from "@/lib/errors";
import type { GraphInput, GraphNode, GraphOption, TreeGraph } from "./graph-types";

export type { GraphInput, TreeGraph };
export { toDxTree } from "./dx";

/** Loads one version's graph: nodes, options (in tree order) with their evidence, and causes. */
export async function loadGraph(versionId: number, conn: Db | Tx = db): Promise<TreeGraph | null> {
  const [version] = await conn.select().from(treeVersions).where(eq(treeVersions.id, versionId)).limit(1);
  if (!version) return null;
  const [causeRows, nodeRows, optionRows] = await Promise.all([
    conn
      .select({ causeId: causes.id, slug: causes.slug, name: causes.name, priorWeight: treeCauses.priorWeight, inspectMinutes: causes.inspectMinutes })
      .from(treeCauses)
      .innerJoin(causes, eq(causes.id, treeCauses.causeId))
      .where(eq(treeCauses.versionId, versionId))
      .orderBy(asc(causes.name)),
    conn
      .select({ node: treeNodes, causeSlug: causes.slug })
      .from(treeNodes)
      .leftJoin(causes, eq(causes.id, treeNodes.causeId))
      .where(eq(treeNodes.versionId, versionId))
      .orderBy(asc(treeNodes.id)),
    conn.select().from(treeOptions).where(eq(treeOptions.versionId, versionId)).orderBy(asc(treeOptions.sortOrder), asc(treeOptions.id)),
  ]);
  const evidenceRows = optionRows.length
    ? await conn
        .select({ optionId: optionEvidence.optionId, slug: causes.slug, strength: optionEvidence.strength })
        .from(optionEvidence)
        .innerJoin(causes, eq(causes.id, optionEvidence.causeId))
        .where(inArray(optionEvidence.optionId, optionRows.map((o) => o.id)))
    : [];
  const keyOfNode = new Map(nodeRows.map((r) => [r.node.id, r.node.key]));
  const evidenceOf = new Map<number, Record<string, GraphOption["evidence"][string]>>();
  for (const e of evidenceRows) {
    const map = evidenceOf.get(e.optionId) ?? {};
    map[e.slug] = e.strength;
    evidenceOf.set(e.optionId, map);
  }
  const nodes: GraphNode[] = nodeRows.map(({ node, causeSlug }) => ({
    id: node.id, key: node.key, kind: node.kind, title: node.title, prompt: node.prompt, costMinutes: node.costMinutes,
    needsOpening: node.needsOpening, causeSlug: causeSlug ?? null, cautionText: node.cautionText, posX: node.posX, posY: node.posY,
  }));
  const options: GraphOption[] = optionRows.map((o) => ({
    id: o.id, key: o.key, fromKey: keyOfNode.get(o.fromNodeId) ?? "", toKey: o.toNodeId ? keyOfNode.get(o.toNodeId) ?? null : null,
    label: o.label, dontKnow: o.dontKnow, sortOrder: o.sortOrder, evidence: evidenceOf.get(o.id) ?? {},
  }));
  return {
    versionId: version.id, treeId: version.treeId, number: version.number, state: version.state, rootKey: version.rootKey,
    revision: version.revision, causes: causeRows, nodes, options,
  };
}

/**
 * Replaces a draft version's graph with `input` inside the caller's transaction. Keys and cause
 * slugs must resolve; anything unknown is a 422 with the offending key, and nothing is written.
 */
export async function writeGraph(tx: Tx, versionId: number, input: GraphInput): Promise<void> {
  const slugs = new Set<string>([
    ...input.causes.map((c) => c.slug),
    ...input.nodes.flatMap((n) => (n.causeSlug ? [n.causeSlug] : [])),
    ...input.options.flatMap((o) => Object.keys(o.evidence)),
  ]);
  const causeRows = slugs.size
    ? await tx.select({ id: causes.id, slug: causes.slug }).from(causes).where(inArray(causes.slug, [...slugs]))
    : [];
  const causeIdOf = new Map(causeRows.map((c) => [c.slug, c.id]));
  const unknown = [...slugs].filter((s) => !causeIdOf.has(s));
  if (unknown.length) throw new AppError("invalid", `Unknown cause${unknown.length > 1 ? "s" : ""} in the catalogue: ${unknown.join(", ")}.`);

  await tx.delete(treeOptions).where(eq(treeOptions.versionId, versionId));
  await tx.delete(treeNodes).where(eq(treeNodes.versionId, versionId));
  await tx.delete(treeCauses).where(eq(treeCauses.versionId, versionId));

  if (input.causes.length) {
    await tx.insert(treeCauses).values(input.causes.map((c) => ({ versionId, causeId: causeIdOf.get(c.slug)!, priorWeight: c.priorWeight })));
  }
  const nodeIdOf = new Map<string, number>();
  if (input.nodes.length) {
    const inserted = await tx
      .insert(treeNodes)
      .values(input.nodes.map((n) => ({
        versionId, key: n.key, kind: n.kind, title: n.title, prompt: n.prompt, costMinutes: n.costMinutes,
        needsOpening: n.needsOpening, causeId: n.causeSlug ? causeIdOf.get(n.causeSlug)! : null, cautionText: n.cautionText,
        posX: n.posX, posY: n.posY,
      })))
      .returning({ id: treeNodes.id, key: treeNodes.key });
    for (const row of inserted) nodeIdOf.set(row.key, row.id);
  }
  const badFrom = input.options.find((o) => !nodeIdOf.has(o.fromKey));
  if (badFrom) throw new AppError("invalid", `Option "${badFrom.key}" leaves node "${badFrom.fromKey}", which does not exist.`);
  const badTo = input.options.find((o) => o.toKey && !nodeIdOf.has(o.toKey));
  if (badTo) throw new AppError("invalid", `Option "${badTo.key}" leads to node "${badTo.toKey}", which does not exist.`);
  if (input.options.length) {
    const inserted = await tx
      .insert(treeOptions)
      .values(input.options.map((o, i) => ({
        versionId, key: o.key, fromNodeId: nodeIdOf.get(o.fromKey)!, toNodeId: o.toKey ? nodeIdOf.get(o.toKey)! : null,
        label: o.label, dontKnow: o.dontKnow, sortOrder: i,
      })))
      .returning({ id: treeOptions.id, key: treeOptions.key });
    const optionIdOf = new Map(inserted.map((r) => [r.key, r.id]));
    const evidence = input.options.flatMap((o) =>
      Object.entries(o.evidence).map(([slug, strength]) => ({ optionId: optionIdOf.get(o.key)!, causeId: causeIdOf.get(slug)!, strength })),
    );
    if (evidence.length) await tx.insert(optionEvidence).values(evidence);
  }
  await tx.update(treeVersions).set({ rootKey: input.rootKey }).where(eq(treeVersions.id, versionId));
}
