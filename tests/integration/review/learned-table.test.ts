import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { learnedLikelihoods, trees, treeVersions } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { learnLikelihoods, rankingAfter } from "@/lib/diagnosis";
import { reopenCaseAction, saveOutcomeAction } from "@/lib/outcomes/actions";
import { closedCasesOf, shopWeights } from "@/lib/review/closed-cases";
import { relearn, type LikelihoodTable } from "@/lib/review/learned";
import { answerStepAction } from "@/lib/triage/answer";
import { loadCaseContext } from "@/lib/triage/context";
import { saveDiagnosisSettings } from "@/lib/triage/save-diagnosis-settings";
import { startCaseAction } from "@/lib/triage/start";
import { loadGraph, toDxTree } from "@/lib/trees/graph";
import { createRoleUsers } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { day, demoIds, insertCases, times, type DemoIds } from "../reports/fixtures";

// The stored table of learned likelihoods must always be what the engine would learn now, from the
// version's closed cases and the shop's strength weights: checked against a fresh computation after
// each of its writers (closing, reopening, saving the settings), and read by triage.
const TREE = "clicking-under-load";
const CAUSE = "mount-bolts-loose";
const bolts = { family: "orvanta-tessel-2", tree: TREE, closedAt: day("2025-04-01"), primary: CAUSE, answers: ["o-when-bumps"] };

describe("the stored table of learned likelihoods", () => {
  let ids: DemoIds;
  let users: Awaited<ReturnType<typeof createRoleUsers>>;
  let versionId: number;
  let treeId: number;

  const stored = async () => (await db.select().from(learnedLikelihoods).where(eq(learnedLikelihoods.versionId, versionId)))[0];
  const fresh = async () => {
    const closed = await closedCasesOf(versionId);
    const { likelihoods } = learnLikelihoods(toDxTree((await loadGraph(versionId))!), closed, undefined, { weights: await shopWeights() });
    return { cases: closed.length, likelihoods };
  };
  const expectCurrent = async () => {
    const row = await stored();
    const now = await fresh();
    expect(row.cases).toBe(now.cases);
    expect(row.likelihoods).toEqual(now.likelihoods);
    return row;
  };
  const onBench = async () => (await insertCases(ids, [{ ...bolts, status: "on_bench", closedAt: null, primary: undefined, answers: ["o-when-load"] }]))[0];
  const close = (caseId: number) => executeAction(saveOutcomeAction, { caseId: String(caseId), intent: "close", causeId: String(ids.cause(CAUSE)), labourMinutes: "30" }, users.tech);

  beforeAll(async () => {
    await resetToDemo();
    users = await createRoleUsers();
    ids = await demoIds();
    versionId = ids.version(TREE).id;
    [{ treeId }] = await db.select({ treeId: treeVersions.treeId }).from(treeVersions).where(eq(treeVersions.id, versionId));
    await insertCases(ids, times(30, bolts));
  });

  afterAll(async () => {
    await saveDiagnosisSettings({});
    await db.update(trees).set({ likelihoodMode: "auto" }).where(eq(trees.id, treeId));
  });

  it("closing a case learns it again in the same transaction, and reopening takes the case out again", async () => {
    const before = await expectCurrent();
    expect(before.cases).toBe(30);
    const caseId = await onBench();
    const closed = await close(caseId);
    expect(closed.ok, JSON.stringify(closed)).toBe(true);
    const after = await expectCurrent();
    expect(after.cases).toBe(31);
    // The new case answered "under load", so that answer's share for the cause rose.
    expect(after.likelihoods["o-when-load"][CAUSE]).toBeGreaterThan(before.likelihoods["o-when-load"][CAUSE]);

    const reopened = await executeAction(reopenCaseAction, { caseId: String(caseId), reason: "The bolts were fine after all." }, users.senior);
    expect(reopened.ok, JSON.stringify(reopened)).toBe(true);
    const back = await expectCurrent();
    expect(back.cases).toBe(30);
    expect(back.likelihoods).toEqual(before.likelihoods);
  });

  it("two cases closing at once on one version both end up in the table", async () => {
    const { cases: before } = await expectCurrent();
    const [a, b] = [await onBench(), await onBench()];
    const results = await Promise.all([close(a), close(b)]);
    expect(results.map((r) => r.ok)).toEqual([true, true]);
    expect((await expectCurrent()).cases).toBe(before + 2);
  });

  it("saving the shop's diagnosis settings learns every table again with the new strength weights", async () => {
    const before = await expectCurrent();
    await saveDiagnosisSettings({ weights: { against: 0.5 } });
    const after = await expectCurrent();
    expect(after.likelihoods).not.toEqual(before.likelihoods);
    // Every other version a case was walked on is current too.
    const others = await db.select({ id: learnedLikelihoods.versionId }).from(learnedLikelihoods);
    expect(others.length).toBeGreaterThan(0);
    await saveDiagnosisSettings({});
    expect((await expectCurrent()).likelihoods).toEqual(before.likelihoods);
  });

  it("triage scores with the stored table where the tree's setting says learned, and not below the history the setting needs", async () => {
    const started = await executeAction(startCaseAction, {
      callerName: "Ilse Marrow", callerKind: "rider", phone: "+00 555 0100 4455", email: "", familyId: ids.family("orvanta-tessel-2"), serial: "",
      ridingUse: "road", treeVersionId: versionId, callerWords: "",
    }, users.tech);
    if (!started.ok) throw new Error(JSON.stringify(started));
    const caseId = started.data.id;
    // "auto" with 32 closed cases: too few, the authored strengths stand.
    expect((await loadCaseContext(caseId))!.settings.likelihoods).toBeUndefined();

    await db.update(trees).set({ likelihoodMode: "learned" }).where(eq(trees.id, treeId));
    // Swap two answers' values for the cause in the stored row: only a reader of the row sees that.
    const row = await stored();
    const swapped: LikelihoodTable = structuredClone(row.likelihoods);
    [swapped["o-when-bumps"][CAUSE], swapped["o-when-load"][CAUSE]] = [swapped["o-when-load"][CAUSE], swapped["o-when-bumps"][CAUSE]];
    await db.update(learnedLikelihoods).set({ likelihoods: swapped }).where(eq(learnedLikelihoods.versionId, versionId));
    try {
      const ctx = (await loadCaseContext(caseId))!;
      expect(ctx.settings.likelihoods).toEqual(swapped);
      const { nodeId, optionId } = ids.version(TREE).option("o-when-bumps");
      const answered = await executeAction(answerStepAction, { caseId, nodeId, optionId }, users.tech);
      if (!answered.ok) throw new Error(JSON.stringify(answered));
      const dx = toDxTree((await loadGraph(versionId))!);
      expect(answered.data.ranking).toEqual(rankingAfter(dx, [{ nodeId: "q-when", optionId: "o-when-bumps" }], ctx.settings));
    } finally {
      await db.transaction((tx) => relearn(tx, versionId));
    }
  });
});
