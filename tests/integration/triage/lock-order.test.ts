import { asc, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { caseSteps } from "@/db/schema";
import { executeAction, type ActionResult } from "@/lib/actions/define";
import { rankingAfter } from "@/lib/diagnosis";
import { answerStepAction } from "@/lib/triage/answer";
import { finishCaseAction } from "@/lib/triage/finish";
import { loadCaseContext } from "@/lib/triage/context";
import type { StoredRanking } from "@/lib/triage/ranking-types";
import { undoStepAction } from "@/lib/triage/undo";
import { publishedTree } from "@/lib/triage/tree-cache";
import { db } from "../../support/db";
import { idsOf, pedalSlipCase } from "./helpers";

// Answer, undo and finish lock the case row before they touch its steps. Run against one case at
// the same time, they must wait for each other, never deadlock (SQLSTATE 40P01 would surface as a
// 500), and leave steps 1..n in order, each with the ranking the engine gives for the answers up to it.
describe("answers, undos and the finish on one case at the same time", () => {
  const fx = pedalSlipCase();
  const ROUNDS = 25;

  const steps = () => db.select().from(caseSteps).where(eq(caseSteps.caseId, fx.caseId)).orderBy(asc(caseSteps.seq));

  async function expectConsistent() {
    const stored = await steps();
    expect(stored.map((s) => s.seq)).toEqual(stored.map((_, i) => i + 1));
    const ctx = (await loadCaseContext(fx.caseId))!;
    const tree = await publishedTree(ctx.treeVersionId);
    const answers = stored.map((s) => ({ nodeId: tree.nodeById.get(s.nodeId)!.key, optionId: tree.optionById.get(s.optionId)!.key }));
    stored.forEach((s, i) => expect(s.ranking as StoredRanking).toEqual(rankingAfter(tree.dx, answers.slice(0, i + 1), ctx.settings)));
    return stored;
  }

  function expectNoServerError(results: ActionResult<unknown>[]) {
    for (const r of results) {
      // 409 is the honest answer when the step to undo is no longer the last one; 500 never is.
      if (!r.ok) expect([409], JSON.stringify(r)).toContain(r.status);
    }
  }

  it(`${ROUNDS} rounds of an answer and an undo of the last step, sent together`, async () => {
    const what = await idsOf(fx.versionId, "q-what", "Pedals spin forward");
    const onset = await idsOf(fx.versionId, "q-onset", "Suddenly");
    const first = await executeAction(answerStepAction, { caseId: fx.caseId, nodeId: what.nodeId, optionId: what.optionId }, fx.tech);
    expect(first.ok).toBe(true);
    for (let round = 0; round < ROUNDS; round++) {
      const last = (await steps()).at(-1)!;
      const results = await Promise.all([
        executeAction(answerStepAction, { caseId: fx.caseId, nodeId: onset.nodeId, optionId: onset.optionId }, fx.tech),
        executeAction(undoStepAction, { caseId: fx.caseId, seq: last.seq }, fx.tech),
      ]);
      expectNoServerError(results);
      const stored = await expectConsistent();
      // The undo removed the step it was sent for or found it was no longer the last; the answer always lands.
      expect(results[0].ok).toBe(true);
      expect(stored.length).toBe(results[1].ok ? last.seq : last.seq + 1);
      if (stored.length === 0) {
        const again = await executeAction(answerStepAction, { caseId: fx.caseId, nodeId: what.nodeId, optionId: what.optionId }, fx.tech);
        expect(again.ok).toBe(true);
      }
    }
  });

  it("many answers and undos at once, then the finish among them", async () => {
    const what = await idsOf(fx.versionId, "q-what", "Pedals spin forward");
    const onset = await idsOf(fx.versionId, "q-onset", "Suddenly");
    await executeAction(answerStepAction, { caseId: fx.caseId, nodeId: what.nodeId, optionId: what.optionId }, fx.tech);
    for (let round = 0; round < ROUNDS; round++) {
      const results = await Promise.all(Array.from({ length: 6 }, (_, i) => i % 2
        ? executeAction(undoStepAction, { caseId: fx.caseId, seq: 1 + Math.floor(i / 2) }, fx.tech)
        : executeAction(answerStepAction, { caseId: fx.caseId, nodeId: onset.nodeId, optionId: onset.optionId }, fx.tech)));
      expectNoServerError(results);
      await expectConsistent();
    }
    const final = await Promise.all([
      executeAction(finishCaseAction, { caseId: fx.caseId, outcome: "advised", advice: "Checked the freewheel by phone." }, fx.tech),
      executeAction(answerStepAction, { caseId: fx.caseId, nodeId: onset.nodeId, optionId: onset.optionId }, fx.tech),
      executeAction(undoStepAction, { caseId: fx.caseId, seq: 1 }, fx.tech),
    ]);
    expectNoServerError(final);
    expect(final[0].ok || (!final[0].ok && final[0].status === 409)).toBe(true);
    await expectConsistent();
  });
});
