// The benchmarks' generated case: a 300-node tree with 30 answers recorded, as a long call would leave it.
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { causes, motorFamilies, trees, treeVersions, users, CAUSE_AREAS } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";
import { createSession } from "@/lib/auth/session";
import { prng } from "@/lib/random";
import { recordAnswer } from "@/lib/triage/answer";
import { startCase } from "@/lib/triage/start";
import type { GraphInput } from "@/lib/trees/graph-types";
import { loadGraph, writeGraph } from "@/lib/trees/graph";

export const NODES = 300;
export const CAUSE_COUNT = 30;
const OPTIONS_PER_NODE = 3;
const EVIDENCE_PER_OPTION = 4;
export const STEPS = 30;
const STRENGTHS = ["rules_out", "against", "for", "for", "strong", "against"] as const;

function generateGraph(slugs: string[], seed: number): GraphInput {
  const random = prng(seed);
  const pick = <T>(items: readonly T[]) => items[Math.floor(random() * items.length)];
  const asking = NODES - slugs.length;
  const nodes: GraphInput["nodes"] = [];
  const options: GraphInput["options"] = [];
  for (let i = 0; i < asking; i++) {
    const check = random() < 0.3;
    nodes.push({ key: `n${i}`, kind: check ? "check" : "question", title: `Generated ${check ? "check" : "question"} ${i}`, prompt: "Generated for the benchmark.",
      costMinutes: check ? 5 + Math.floor(random() * 26) : 1, needsOpening: false, causeSlug: null, cautionText: "", posX: 0, posY: i * 10 });
    for (let o = 0; o < OPTIONS_PER_NODE; o++) {
      const target = i + 1 + Math.floor(random() * Math.min(40, NODES - i - 1));
      const evidence: Record<string, (typeof STRENGTHS)[number]> = {};
      for (let e = 0; e < EVIDENCE_PER_OPTION; e++) evidence[pick(slugs)] = pick(STRENGTHS);
      options.push({ key: `n${i}-o${o}`, fromKey: `n${i}`, toKey: target < asking ? `n${target}` : `c${target - asking}`, label: `option ${o}`, dontKnow: false, evidence });
    }
  }
  slugs.forEach((slug, k) => nodes.push({ key: `c${k}`, kind: "cause", title: `Cause ${k}`, prompt: "Generated.", costMinutes: 1, needsOpening: false, causeSlug: slug, cautionText: "", posX: 0, posY: 0 }));
  return { rootKey: "n0", causes: slugs.map((slug) => ({ slug, priorWeight: 1 + Math.floor(random() * 9) })), nodes, options };
}

/**
 * A generated published tree of NODES nodes and CAUSE_COUNT causes, a technician with a session,
 * and an open case on it with STEPS answers recorded along the suggestions (options at random).
 * Returns the case, the session token and the next answer to give.
 */
export async function setUpGeneratedCase() {
  const stamp = Date.now().toString(36);
  const slugs = Array.from({ length: CAUSE_COUNT }, (_, k) => `bench-${stamp}-cause-${k}`);
  await db.insert(causes).values(slugs.map((slug, k) => ({ slug, name: `Benchmark cause ${k}`, area: CAUSE_AREAS[k % CAUSE_AREAS.length], inspectMinutes: 10 + (k % 5) * 5 })));
  const versionId = await db.transaction(async (tx) => {
    const [tree] = await tx.insert(trees).values({ slug: `bench-${stamp}`, symptom: "Benchmark symptom", title: "Generated 300-node tree" }).returning({ id: trees.id });
    const [version] = await tx.insert(treeVersions).values({ treeId: tree.id, number: 1 }).returning({ id: treeVersions.id });
    await writeGraph(tx, version.id, generateGraph(slugs, 20261));
    await tx.update(treeVersions).set({ state: "published", publishedAt: new Date() }).where(eq(treeVersions.id, version.id));
    return version.id;
  });
  const userId = `bench-tech-${stamp}`;
  await db.insert(users).values({ id: userId, email: `${userId}@rootbench.test`, name: "Benchmark Technician", role: "tech", passwordHash: await hashPassword(`unused-${stamp}-password`) });
  const { token } = await createSession(userId);
  const [family] = await db.select({ id: motorFamilies.id }).from(motorFamilies).limit(1);
  const kase = await startCase({ callerName: "Benchmark Caller", callerKind: "rider", phone: "+00 555 0100 0000", email: "", familyId: family.id, serial: "",
    ridingUse: "road", treeVersionId: versionId, callerWords: "" }, userId);

  // 30 steps along the suggestions, as a technician might walk; options chosen at random.
  const graph = (await loadGraph(versionId))!;
  const random = prng(7);
  let next: { nodeId: number; optionId: number } | null = null;
  for (let i = 0; i <= STEPS; i++) {
    const node = next ? graph.nodes.find((n) => n.id === next!.nodeId)! : graph.nodes.find((n) => n.key === graph.rootKey)!;
    const choices = graph.options.filter((o) => o.fromKey === node.key);
    const pickOption = choices[Math.floor(random() * choices.length)];
    const chosen = { nodeId: node.id, optionId: pickOption.id };
    if (i === STEPS) return { token, userId, versionId, caseId: kase.id, answer: chosen };
    const { ranking } = await recordAnswer({ caseId: kase.id, ...chosen }, userId);
    const best = ranking.suggestions[0];
    if (!best) throw new Error("the generated tree ran out of questions");
    const bestNode = graph.nodes.find((n) => n.key === best.nodeId)!;
    next = { nodeId: bestNode.id, optionId: 0 };
  }
  throw new Error("unreachable");
}
