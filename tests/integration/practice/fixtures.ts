import { asc, eq } from "drizzle-orm";
import { caseOutcomes, cases, caseSteps, causes, motorFamilies, outcomeCauses, outcomeParts, parts, treeVersions } from "@/db/schema";
import { rankingAfter, type DxSettings } from "@/lib/diagnosis";
import { storeOutcomeCopies } from "@/lib/outcomes/outcome-copies";
import { loadGraph, toDxTree } from "@/lib/trees/graph";
import type { TreeGraph } from "@/lib/trees/graph-types";
import { db } from "../../support/db";

let counter = 0;

/** The path a caller's answers take: from the root, the given option index at each question (default the first). */
export function walkOptions(graph: TreeGraph, pick: (nodeKey: string, count: number) => number = () => 0) {
  const steps: { nodeId: number; optionId: number; causeSlug: string | null }[] = [];
  let key = graph.rootKey;
  const seen = new Set<string>();
  while (key && !seen.has(key)) {
    seen.add(key);
    const node = graph.nodes.find((n) => n.key === key)!;
    if (node.kind === "cause") return { steps, reached: node.causeSlug };
    const options = graph.options.filter((o) => o.fromKey === key);
    if (options.length === 0) break;
    const option = node.kind === "caution" ? options[0] : options[Math.min(pick(key, options.length), options.length - 1)];
    if (node.kind !== "caution") steps.push({ nodeId: node.id, optionId: option.id, causeSlug: null });
    key = option.toKey;
  }
  return { steps, reached: null };
}

export async function firstPublishedGraph(): Promise<TreeGraph> {
  const [version] = await db.select({ id: treeVersions.id }).from(treeVersions).where(eq(treeVersions.state, "published")).orderBy(asc(treeVersions.id)).limit(1);
  return (await loadGraph(version.id))!;
}

export const CALLER = { callerName: "Imra Vantelow", phone: "+00 555 0199 42", email: "imra.vantelow@example.test", serial: "QX-77-31415" };

/** Settings unlike the defaults, as if the shop had changed them since: the stored rankings were worked out with these. */
export const SETTINGS_AT_THE_TIME: DxSettings = { weights: { strong: 30, for: 5 }, unlistedShare: 0.2 };

/**
 * A case walked on `graph` along `walk`, with the given status, each step storing the ranking the
 * engine gave with SETTINGS_AT_THE_TIME; closed cases get a bench outcome confirming `confirmed`
 * (a cause slug), a part and the usual outcome row.
 */
export async function insertCase(graph: TreeGraph, walk: ReturnType<typeof walkOptions>, options: { status?: "closed" | "open"; confirmed?: string | null } = {}) {
  const [family] = await db.select({ id: motorFamilies.id }).from(motorFamilies).limit(1);
  const status = options.status ?? "closed";
  const [row] = await db
    .insert(cases)
    .values({
      reference: `PR-${Date.now().toString(36)}-${counter++}`, status, ...CALLER, callerKind: "rider", familyId: family.id, ridingUse: "trail",
      symptom: "It clicks when I climb", treeVersionId: graph.versionId, notes: "Called from the car park.", closedAt: status === "closed" ? new Date() : null,
    })
    .returning({ id: cases.id });
  if (walk.steps.length) {
    const dx = toDxTree(graph);
    const answers = walk.steps.map((s) => ({ nodeId: graph.nodes.find((n) => n.id === s.nodeId)!.key, optionId: graph.options.find((o) => o.id === s.optionId)!.key }));
    await db.insert(caseSteps).values(walk.steps.map((s, i) => ({
      caseId: row.id, seq: i + 1, nodeId: s.nodeId, optionId: s.optionId, ranking: rankingAfter(dx, answers.slice(0, i + 1), SETTINGS_AT_THE_TIME),
    })));
  }
  const confirmed = options.confirmed === undefined ? walk.reached : options.confirmed;
  if (status === "closed" && confirmed) {
    const [cause] = await db.select({ id: causes.id }).from(causes).where(eq(causes.slug, confirmed));
    const [part] = await db.select({ id: parts.id }).from(parts).limit(1);
    await db.insert(caseOutcomes).values({ caseId: row.id, labourMinutes: 95, upgrades: "Uprated clutch", notes: "Cage cracked on two pockets." });
    await db.insert(outcomeCauses).values({ caseId: row.id, causeId: cause.id });
    await db.insert(outcomeParts).values({ caseId: row.id, partId: part.id, quantity: 1 });
    await db.transaction((tx) => storeOutcomeCopies(tx, [row.id]));
  }
  return row.id;
}
