import { rmSync } from "node:fs";
import { asc, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { caseEvents, caseOutcomes, cases, caseSteps, outcomeCauses, outcomeParts, practiceAttempts } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import type { SessionUser } from "@/lib/auth/session-user";
import { commitPracticeAction } from "@/lib/practice/actions";
import { practiceHistory } from "@/lib/practice/history";
import { listPracticeCases, loadPracticeReplay } from "@/lib/practice/queries";
import type { BenchResult } from "@/lib/practice/types";
import type { TreeGraph } from "@/lib/trees/graph-types";
import { rankingAfter } from "@/lib/diagnosis";
import type { StoredRanking } from "@/lib/triage/ranking-types";
import { toDxTree } from "@/lib/trees/graph";
import { countRows, createUser, db } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { useTemporaryUploads } from "../writeups/fixtures";
import { CALLER, firstPublishedGraph, insertCase, SETTINGS_AT_THE_TIME, walkOptions } from "./fixtures";

let dir: string;
let graph: TreeGraph;
let closedId: number, openId: number, unconfirmedId: number;
let trainee: SessionUser;
let walk: ReturnType<typeof walkOptions>;

const commit = (input: Record<string, unknown>, user = trainee) => executeAction(commitPracticeAction, input, user);

async function realCaseSnapshot() {
  return {
    cases: await db.select().from(cases).orderBy(asc(cases.id)),
    steps: await db.select().from(caseSteps).orderBy(asc(caseSteps.id)),
    outcomes: await db.select().from(caseOutcomes),
    causes: await db.select().from(outcomeCauses),
    parts: await db.select().from(outcomeParts),
    events: await db.select().from(caseEvents),
  };
}

beforeAll(async () => {
  dir = useTemporaryUploads();
  await resetToDemo();
  graph = await firstPublishedGraph();
  walk = walkOptions(graph);
  expect(walk.steps.length).toBeGreaterThan(1);
  expect(walk.reached).toBeTruthy();
  closedId = await insertCase(graph, walk);
  openId = await insertCase(graph, walk, { status: "open" });
  unconfirmedId = await insertCase(graph, walk, { confirmed: null });
  trainee = await createUser("trainee");
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("the practice list", () => {
  it("offers closed, walked, confirmed cases only, and never the caller's details", async () => {
    const list = await listPracticeCases(trainee.id);
    expect(list.rows.map((r) => r.id)).toEqual([closedId]);
    expect(list.total).toBe(1);
    const json = JSON.stringify(list.rows);
    for (const secret of Object.values(CALLER)) expect(json).not.toContain(secret);
    expect(Object.keys(list.rows[0]).sort()).toEqual(["attempts", "callerKind", "closedAt", "family", "id", "ridingUse", "steps", "symptom", "treeTitle"]);
    expect(list.rows[0].steps).toBe(walk.steps.length);
  });

  it("filters by motor family", async () => {
    expect((await listPracticeCases(trainee.id, { family: "no-such-family" })).rows).toEqual([]);
  });
});

describe("replaying a case", () => {
  it("gives each recorded question and answer in order, with the engine's ranking after each", async () => {
    const replay = await loadPracticeReplay(closedId);
    expect(replay.steps).toHaveLength(walk.steps.length);
    const expected = walk.steps.map((s) => {
      const node = graph.nodes.find((n) => n.id === s.nodeId)!;
      return { title: node.title, answer: graph.options.find((o) => o.id === s.optionId)!.label };
    });
    expect(replay.steps.map((s) => ({ title: s.title, answer: s.answer }))).toEqual(expected);
    expect(replay.rankings).toHaveLength(walk.steps.length + 1);
    for (const r of replay.rankings) {
      // The causes and the unlisted hypothesis share all the probability (posterior normalised).
      expect(r.causes.reduce((a, c) => a + c.probability, r.unlisted)).toBeCloseTo(1, 9);
    }
    expect(replay.choices.map((c) => c.slug).sort()).toEqual(graph.causes.map((c) => c.slug).sort());
  });

  it("shows the ranking each step stored (what the technician saw), not one worked out again now", async () => {
    const replay = await loadPracticeReplay(closedId);
    const stored = await db.select({ ranking: caseSteps.ranking }).from(caseSteps).where(eq(caseSteps.caseId, closedId)).orderBy(asc(caseSteps.seq));
    const view = (r: StoredRanking) => r.causes.map((c) => [c.causeId, c.probability]);
    expect(replay.rankings.slice(1).map((r) => r.causes.map((c) => [c.slug, c.probability]))).toEqual(stored.map((s) => view(s.ranking as StoredRanking)));
    // The shop's settings today are the defaults, which rank differently from the settings of the time.
    const dx = toDxTree(graph);
    const key = (id: number) => graph.options.find((o) => o.id === id)!.key;
    const nodeKey = (id: number) => graph.nodes.find((n) => n.id === id)!.key;
    const answers = walk.steps.map((s) => ({ nodeId: nodeKey(s.nodeId), optionId: key(s.optionId) }));
    expect(view(rankingAfter(dx, answers))).not.toEqual(view(rankingAfter(dx, answers, SETTINGS_AT_THE_TIME)));
  });

  it("never carries the caller's details, the case notes or the bench result", async () => {
    const json = JSON.stringify(await loadPracticeReplay(closedId));
    for (const secret of [...Object.values(CALLER), "Called from the car park", "Cage cracked", "Uprated clutch"]) expect(json).not.toContain(secret);
  });

  it("is refused for an open case or one without a confirmed cause", async () => {
    await expect(loadPracticeReplay(openId)).rejects.toMatchObject({ status: 404 });
    await expect(loadPracticeReplay(unconfirmedId)).rejects.toMatchObject({ status: 404 });
  });
});

describe("committing to a cause", () => {
  it("records a hit when the committed cause was confirmed, and only then shows the bench result", async () => {
    const before = await realCaseSnapshot();
    const result = await commit({ caseId: String(closedId), cause: walk.reached!, revealedSteps: "2" });
    expect(result.ok).toBe(true);
    const data = (result as { data: BenchResult }).data;
    expect(data).toMatchObject({ hit: true, committed: { slug: walk.reached }, labourMinutes: 95, upgrades: "Uprated clutch", notes: "Cage cracked on two pockets." });
    expect(data.confirmed.map((c) => c.slug)).toEqual([walk.reached]);
    expect(data.parts).toHaveLength(1);
    const [attempt] = await db.select().from(practiceAttempts).where(eq(practiceAttempts.caseId, closedId));
    expect(attempt).toMatchObject({ traineeId: trainee.id, revealedSteps: 2, hit: true });
    expect(attempt.finishedAt).toBeInstanceOf(Date);
    // Practice never touches the real case or anything the shop's statistics read.
    expect(await realCaseSnapshot()).toEqual(before);
  });

  it("records a miss for another cause of the tree", async () => {
    const other = graph.causes.find((c) => c.slug !== walk.reached)!;
    const result = await commit({ caseId: String(closedId), cause: other.slug, revealedSteps: "999" });
    expect(result).toMatchObject({ ok: true, data: { hit: false } });
    const attempts = await db.select().from(practiceAttempts).where(eq(practiceAttempts.traineeId, trainee.id)).orderBy(asc(practiceAttempts.id));
    expect(attempts.at(-1)).toMatchObject({ hit: false, revealedSteps: walk.steps.length });
  });

  it("refuses a cause outside the tree and a case not open for practice, writing nothing", async () => {
    const before = await countRows("practice_attempts");
    expect(await commit({ caseId: String(closedId), cause: "no-such-cause" })).toMatchObject({ ok: false, status: 422, fieldErrors: { cause: expect.any(String) } });
    expect(await commit({ caseId: String(openId), cause: walk.reached! })).toMatchObject({ ok: false, status: 404 });
    expect(await commit({ caseId: String(closedId) })).toMatchObject({ ok: false, status: 400 });
    expect(await countRows("practice_attempts")).toBe(before);
  });

  it("any role may practise, each with their own history", async () => {
    const tech = await createUser("tech");
    expect(await commit({ caseId: String(closedId), cause: walk.reached! }, tech)).toMatchObject({ ok: true });
    expect((await practiceHistory(tech.id)).attempts).toBe(1);
  });

  it("the trainee's history counts cases done and top-1 hits", async () => {
    const history = await practiceHistory(trainee.id);
    expect(history).toMatchObject({ casesDone: 1, attempts: 2, hits: 1 });
    expect(history.recent.map((a) => a.hit)).toEqual([false, true]);
    expect(history.recent[0].caseId).toBe(closedId);
  });
});
