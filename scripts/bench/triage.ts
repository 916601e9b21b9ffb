// Server time of the triage answer action on a generated 300-node tree with 30 steps recorded,
// next to a no-op action behind the ordinary session check, in one process and one run. The
// answer is timed as the triage screen runs it (one trip: its insert checks session and role
// itself) and through the ordinary path (session query, then the action) for comparison.
// Needs DATABASE_URL of a seeded bench database (npm run bench triage sets it up).
import { eq, sql as dsql } from "drizzle-orm";
import { db, sql } from "@/db";
import { causes, motorFamilies, trees, treeVersions, users, CAUSE_AREAS } from "@/db/schema";
import { defineAction, executeAction } from "@/lib/actions/define";
import { tryInOneTrip } from "@/lib/actions/one-trip";
import { callerCheck, callerRow } from "@/lib/auth/caller-check";
import { hashPassword } from "@/lib/auth/password";
import { createSession, validateToken } from "@/lib/auth/session";
import { answerStepAction, answersOf, recordAnswer } from "@/lib/triage/answer";
import { loadCaseContext } from "@/lib/triage/context";
import { anticipate, forgetAnticipated } from "@/lib/triage/anticipated-rankings";
import { forgetCase } from "@/lib/triage/context-cache";
import { computeRanking } from "@/lib/triage/ranking";
import { publishedTree } from "@/lib/triage/tree-cache";
import { answerInput } from "@/lib/triage/inputs";
import { startCase } from "@/lib/triage/start";
import { undoLastStep } from "@/lib/triage/undo";
import type { GraphInput } from "@/lib/trees/graph-types";
import { loadGraph, writeGraph } from "@/lib/trees/graph";
import { prng } from "@/lib/random";

const NODES = 300;
const CAUSE_COUNT = 30;
const OPTIONS_PER_NODE = 3;
const EVIDENCE_PER_OPTION = 4;
const STEPS = 30;
const RUNS = 200;
const WARMUP = 20;
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

async function setUp() {
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
    if (i === STEPS) return { token, caseId: kase.id, answer: chosen };
    const { ranking } = await recordAnswer({ caseId: kase.id, ...chosen }, userId);
    const best = ranking.suggestions[0];
    if (!best) throw new Error("the generated tree ran out of questions");
    const bestNode = graph.nodes.find((n) => n.key === best.nodeId)!;
    next = { nodeId: bestNode.id, optionId: 0 };
  }
  throw new Error("unreachable");
}

const noopAction = defineAction({ name: "bench.noop", access: "case:work", input: answerInput, run: async () => null });
const inputOf = (caseId: number, a: { nodeId: number; optionId: number }) => ({ caseId, nodeId: a.nodeId, optionId: a.optionId });

// Between timed calls the process is left idle for a moment, as it is between a technician's
// answers, so work scheduled after one call (scoring ahead) does not land inside the next timing.
const idle = () => new Promise<void>((resolve) => setTimeout(resolve, 8));

function stats(samples: number[]) {
  const sorted = [...samples].sort((a, b) => a - b);
  const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
  return { median: at(0.5), p95: at(0.95) };
}

async function main() {
  const { token, caseId, answer } = await setUp();
  const [{ n }] = await db.select({ n: dsql<number>`count(*)::int` }).from(dsql`case_steps`).where(dsql`case_id = ${caseId}`);
  const answerMs: number[] = [];
  const ordinaryMs: number[] = [];
  const noopMs: number[] = [];
  for (let i = 0; i < WARMUP + RUNS; i++) {
    // Interleaved, so all three see the same machine load.
    await idle();
    let t0 = performance.now();
    const quick = await tryInOneTrip(answerStepAction, inputOf(caseId, answer), token);
    const tAnswer = performance.now() - t0;
    if (!quick) throw new Error("the one-trip answer did not complete");
    await undoLastStep(caseId, quick.result.data.step.seq);

    await idle();
    t0 = performance.now();
    let user = (await validateToken(token))!.user;
    const result = await executeAction(answerStepAction, inputOf(caseId, answer), user);
    const tOrdinary = performance.now() - t0;
    if (!result.ok) throw new Error(`answer failed: ${result.error}`);
    await undoLastStep(caseId, result.data.step.seq);

    await idle();
    t0 = performance.now();
    user = (await validateToken(token))!.user;
    const noop = await executeAction(noopAction, inputOf(caseId, answer), user);
    const tNoop = performance.now() - t0;
    if (!noop.ok) throw new Error(`no-op failed: ${noop.error}`);
    if (i >= WARMUP) {
      answerMs.push(tAnswer);
      ordinaryMs.push(tOrdinary);
      noopMs.push(tNoop);
    }
  }
  // Where the answer's time goes: the engine alone, and the one-round-trip context read alone.
  const ctx = (await loadCaseContext(caseId))!;
  const tree = await publishedTree(ctx.treeVersionId);
  const node = tree.nodeById.get(answer.nodeId)!;
  const option = tree.optionById.get(answer.optionId)!;
  const answers = [...answersOf(tree, ctx.steps), { nodeId: node.key, optionId: option.key }];
  const engineMs: number[] = [];
  const engineColdMs: number[] = [];
  const contextMs: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    let t0 = performance.now();
    computeRanking(tree.dx, answers, ctx.settings, tree.models);
    engineMs.push(performance.now() - t0);
    t0 = performance.now();
    computeRanking(tree.dx, answers, ctx.settings);
    engineColdMs.push(performance.now() - t0);
    t0 = performance.now();
    await loadCaseContext(caseId);
    contextMs.push(performance.now() - t0);
  }
  // The first answer on a case this process does not know yet: the context comes from the database.
  const coldMs: number[] = [];
  for (let i = 0; i < RUNS / 4; i++) {
    forgetCase(caseId);
    await idle();
    const t0 = performance.now();
    const quick = await tryInOneTrip(answerStepAction, inputOf(caseId, answer), token);
    coldMs.push(performance.now() - t0);
    if (!quick) throw new Error("the one-trip answer did not complete");
    await undoLastStep(caseId, quick.result.data.step.seq);
  }

  // The one-trip path's caller check on its own: the session query it folds into the insert.
  const check = callerCheck(token, "case:work")!;
  const checkMs: number[] = [];
  for (let i = 0; i < RUNS / 2; i++) {
    await idle();
    const t0 = performance.now();
    const rows = await sql`${callerRow(sql, check)}`;
    checkMs.push(performance.now() - t0);
    if (rows.length !== 1) throw new Error("the caller check found no session");
  }
  // An answer the server did not see coming (not among the likely next questions' options).
  const unanticipatedMs: number[] = [];
  for (let i = 0; i < RUNS / 4; i++) {
    await idle();
    forgetAnticipated();
    const t0 = performance.now();
    const quick = await tryInOneTrip(answerStepAction, inputOf(caseId, answer), token);
    unanticipatedMs.push(performance.now() - t0);
    if (!quick) throw new Error("the one-trip answer did not complete");
    await undoLastStep(caseId, quick.result.data.step.seq);
  }
  // The work done ahead after each answer, off the request: engine runs for the likely next answers.
  const aheadMs: number[] = [];
  let aheadCount = 0;
  for (let i = 0; i < RUNS / 10; i++) {
    forgetAnticipated();
    const lastRanking = computeRanking(tree.dx, answers.slice(0, -1), ctx.settings, tree.models);
    const t0 = performance.now();
    aheadCount = await anticipate(tree, answers.slice(0, -1), ctx.settings, lastRanking);
    aheadMs.push(performance.now() - t0);
  }

  const a = stats(answerMs);
  const z0 = stats(noopMs);
  console.log(`triage answer action, node ${process.version}: ${NODES}-node tree, ${CAUSE_COUNT} causes, ${n} steps recorded, ${RUNS} runs after ${WARMUP} warm-up`);
  console.log("action                       median ms  p95 ms");
  const o = stats(ordinaryMs);
  console.log(`answer, one trip (screen)    ${a.median.toFixed(3).padStart(9)}  ${a.p95.toFixed(3).padStart(6)}   (the insert checks session and role)`);
  console.log(`answer, session then action  ${o.median.toFixed(3).padStart(9)}  ${o.p95.toFixed(3).padStart(6)}`);
  console.log(`no-op  (session + action)    ${z0.median.toFixed(3).padStart(9)}  ${z0.p95.toFixed(3).padStart(6)}`);
  const e = stats(engineMs);
  const ec = stats(engineColdMs);
  const c = stats(contextMs);
  const cold = stats(coldMs);
  console.log(`answer, case not in memory   ${cold.median.toFixed(3).padStart(9)}  ${cold.p95.toFixed(3).padStart(6)}   (${coldMs.length} runs; context read from the database)`);
  const ck = stats(checkMs);
  const un = stats(unanticipatedMs);
  const ahead = stats(aheadMs);
  console.log(`answer, not anticipated      ${un.median.toFixed(3).padStart(9)}  ${un.p95.toFixed(3).padStart(6)}   (${unanticipatedMs.length} runs; ranking computed in the request)`);
  console.log(`  caller check alone (callerRow, 1 trip)  ${ck.median.toFixed(3).padStart(6)}  ${ck.p95.toFixed(3).padStart(6)}   (what the one trip folds in)`);
  console.log(`  scoring ahead after an answer           ${ahead.median.toFixed(3).padStart(6)}  ${ahead.p95.toFixed(3).padStart(6)}   (${aheadCount} rankings, off the request, wall time)`);
  console.log(`  engine with the version's model cache   ${e.median.toFixed(3).padStart(6)}  ${e.p95.toFixed(3).padStart(6)}`);
  console.log(`  engine building its model afresh        ${ec.median.toFixed(3).padStart(6)}  ${ec.p95.toFixed(3).padStart(6)}`);
  console.log(`  context read (1 round trip)             ${c.median.toFixed(3).padStart(6)}  ${c.p95.toFixed(3).padStart(6)}`);
  console.log(`ratio answer / no-op         ${(a.median / z0.median).toFixed(2).padStart(9)}  ${(a.p95 / z0.p95).toFixed(2).padStart(6)}   (target ≤ 2)`);
  console.log(`ratio session-then-action    ${(o.median / z0.median).toFixed(2).padStart(9)}  ${(o.p95 / z0.p95).toFixed(2).padStart(6)}`);
}

main()
  .catch((error: unknown) => {
    console.error(error);
    process.exitCode = 1;
  })
  .finally(() => sql.end({ timeout: 5 }));
