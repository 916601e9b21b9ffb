import { asc, eq } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { cases, caseSteps, causes, outcomeCauses, trees, treeVersions } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import type { SessionUser } from "@/lib/auth/session-user";
import { answerStepAction } from "@/lib/triage/answer";
import type { StoredRanking } from "@/lib/triage/ranking-types";
import { undoStepAction } from "@/lib/triage/undo";
import { storeOutcomeCopies } from "@/lib/outcomes/outcome-copies";
import { storedLikelihoods } from "@/lib/review/learned";
import { rankNextQuestions, scoreCauses, suggestConclusion, type DxAnswer } from "@/lib/diagnosis";
import { loadGraph, toDxTree } from "@/lib/trees/graph";
import { countRows, createUser, db } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { familyId, idsOf, publishedVersion, startTestCase } from "./helpers";

// A caller whose pedals let go suddenly after a pedal strike, walked along the pedal-slip tree.
const WALK: [string, string][] = [
  ["q-what", "Pedals spin forward"],
  ["q-onset", "Suddenly"],
  ["q-cold", "No difference"],
  ["q-load", "Yes, mostly loaded"],
  ["q-strike", "Yes"],
];

async function stepsOf(caseId: number) {
  return db.select().from(caseSteps).where(eq(caseSteps.caseId, caseId)).orderBy(asc(caseSteps.seq));
}

describe("walking a case through a seeded tree", () => {
  let tech: SessionUser;
  let versionId: number;
  const history: Record<string, number> = { "owc-rollers-worn": 3, "belt-worn": 2 };

  beforeAll(async () => {
    await resetToDemo();
    tech = await createUser("tech");
    versionId = await publishedVersion("pedal-slip");
    // Confirmed history: three closed cases of this family (one confirming two causes), one of another family.
    const closeCase = async (overrides: Record<string, unknown> = {}) => {
      const c = await startTestCase(tech, overrides);
      await db.update(cases).set({ status: "closed", closedAt: new Date() }).where(eq(cases.id, c.id));
      return c.id;
    };
    const closed = [await closeCase(), await closeCase(), await closeCase()];
    const other = await closeCase({ familyId: await familyId("quillon-skarn-1") });
    const slugId = async (slug: string) => (await db.select({ id: causes.id }).from(causes).where(eq(causes.slug, slug)))[0].id;
    const rollers = await slugId("owc-rollers-worn");
    const belt = await slugId("belt-worn");
    await db.insert(outcomeCauses).values([
      { caseId: closed[0], causeId: rollers }, { caseId: closed[1], causeId: rollers }, { caseId: closed[2], causeId: rollers },
      { caseId: closed[0], causeId: belt, primary: false }, { caseId: closed[1], causeId: belt, primary: false },
      { caseId: other, causeId: belt },
    ]);
    await db.transaction((tx) => storeOutcomeCopies(tx, [...closed, other]));
  });

  let caseId: number;
  beforeEach(async () => {
    caseId = (await startTestCase(tech)).id;
  });

  async function walk(n = WALK.length) {
    const given: DxAnswer[] = [];
    for (const [nodeKey, label] of WALK.slice(0, n)) {
      const ids = await idsOf(versionId, nodeKey, label);
      const result = await executeAction(answerStepAction, { caseId, nodeId: ids.nodeId, optionId: ids.optionId }, tech);
      expect(result.ok, JSON.stringify(result)).toBe(true);
      given.push({ nodeId: ids.nodeKey, optionId: ids.optionKey });
    }
    return given;
  }

  it("records each step with its ranking, and the last ranking equals the engine on the same answers", async () => {
    const answers = await walk();
    const steps = await stepsOf(caseId);
    expect(steps.map((s) => s.seq)).toEqual([1, 2, 3, 4, 5]);
    expect(steps.every((s) => s.answeredBy === tech.id)).toBe(true);

    // Recomputed here from the graph and the history inserted above, not through lib/cases.
    const dx = toDxTree((await loadGraph(versionId))!);
    const settings = { history };
    steps.forEach((step, i) => {
      const shown = step.ranking as StoredRanking;
      const expected = scoreCauses(dx, answers.slice(0, i + 1), settings);
      expect(shown.causes).toEqual(expected.causes);
      expect(shown.unlisted).toBe(expected.unlisted);
    });
    const last = steps.at(-1)!.ranking as StoredRanking;
    expect(last.suggestions).toEqual(rankNextQuestions(dx, answers, settings).slice(0, last.suggestions.length));
    expect(last.conclusion).toEqual(suggestConclusion(dx, answers, settings));
    // The pedal strike and the sudden slip put the broken clutch cage first.
    expect(last.causes[0].causeId).toBe("owc-cage-broken");
  });

  it("the history of the case's motor family changes the starting ranking", async () => {
    const dx = toDxTree((await loadGraph(versionId))!);
    const q = await idsOf(versionId, "q-what", "Don't know");
    const result = await executeAction(answerStepAction, { caseId, nodeId: q.nodeId, optionId: q.optionId }, tech);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const withHistory = scoreCauses(dx, [{ nodeId: "q-what", optionId: q.optionKey }], { history });
    const without = scoreCauses(dx, [{ nodeId: "q-what", optionId: q.optionKey }], {});
    expect(result.data.ranking.causes).toEqual(withHistory.causes);
    expect(result.data.ranking.causes).not.toEqual(without.causes);
  });

  it("a tree set to learned likelihoods scores with what lib/review learned from closed cases", async () => {
    const [version] = await db.select({ treeId: treeVersions.treeId }).from(treeVersions).where(eq(treeVersions.id, versionId));
    await db.update(trees).set({ likelihoodMode: "learned" }).where(eq(trees.id, version.treeId));
    try {
      const answers = await walk(2);
      const dx = toDxTree((await loadGraph(versionId))!);
      const likelihoods = await storedLikelihoods(versionId);
      const last = (await stepsOf(caseId)).at(-1)!.ranking as StoredRanking;
      expect(last.causes).toEqual(scoreCauses(dx, answers, { history, likelihoods }).causes);
    } finally {
      await db.update(trees).set({ likelihoodMode: "auto" }).where(eq(trees.id, version.treeId));
    }
  });

  it("undo removes exactly the last step and returns the ranking shown before it", async () => {
    await walk();
    const before = await stepsOf(caseId);
    const result = await executeAction(undoStepAction, { caseId, seq: 5 }, tech);
    expect(result.ok, JSON.stringify(result)).toBe(true);
    const after = await stepsOf(caseId);
    expect(after.map((s) => s.id)).toEqual(before.slice(0, 4).map((s) => s.id));
    if (result.ok) expect(result.data.ranking).toEqual(before[3].ranking);

    // A second undo of the same answer (a double click) takes nothing more away.
    const again = await executeAction(undoStepAction, { caseId, seq: 5 }, tech);
    expect(again.ok).toBe(false);
    if (!again.ok) expect(again.status).toBe(409);
    expect((await stepsOf(caseId)).length).toBe(4);
  });

  it("undoing the only answer goes back to the starting ranking", async () => {
    await walk(1);
    const result = await executeAction(undoStepAction, { caseId, seq: 1 }, tech);
    expect(result.ok).toBe(true);
    const dx = toDxTree((await loadGraph(versionId))!);
    if (result.ok) expect(result.data.ranking.causes).toEqual(scoreCauses(dx, [], { history }).causes);
    expect(await stepsOf(caseId)).toEqual([]);
  });

  it("two answers sent at once both land, one after the other", async () => {
    const a = await idsOf(versionId, "q-what", "Pedals spin forward");
    const b = await idsOf(versionId, "q-onset", "Suddenly");
    const results = await Promise.all([
      executeAction(answerStepAction, { caseId, nodeId: a.nodeId, optionId: a.optionId }, tech),
      executeAction(answerStepAction, { caseId, nodeId: b.nodeId, optionId: b.optionId }, tech),
    ]);
    expect(results.every((r) => r.ok)).toBe(true);
    expect((await stepsOf(caseId)).map((s) => s.seq)).toEqual([1, 2]);
  });

  it("a trainee or a lead calling the answer action gets 403 and nothing is written", async () => {
    const ids = await idsOf(versionId, "q-what", "Pedals spin forward");
    const stepsBefore = await countRows("case_steps");
    for (const role of ["trainee", "lead"] as const) {
      const user = await createUser(role);
      const result = await executeAction(answerStepAction, { caseId, nodeId: ids.nodeId, optionId: ids.optionId }, user);
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.status).toBe(403);
      const undo = await executeAction(undoStepAction, { caseId, seq: 1 }, user);
      expect(!undo.ok && undo.status).toBe(403);
    }
    expect(await countRows("case_steps")).toBe(stepsBefore);
  });
});
