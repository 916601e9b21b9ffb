import { asc, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { caseSteps } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { anticipateForCase, answersOf, answerStepAction } from "@/lib/triage/answer";
import { anticipatedRanking, forgetAnticipated, likelyNextQuestions } from "@/lib/triage/anticipated-rankings";
import { loadCaseContext } from "@/lib/triage/context";
import { computeRanking } from "@/lib/triage/ranking";
import type { StoredRanking } from "@/lib/triage/ranking-types";
import { publishedTree } from "@/lib/triage/tree-cache";
import { walkPath } from "@/lib/diagnosis";
import { db } from "../../support/db";
import { idsOf, pedalSlipCase } from "./helpers";

// While the caller thinks, the server scores the answers they are likely to give next. Using such a
// ranking must never change what is stored: it is the engine's result for the very same inputs.
describe("rankings worked out ahead", () => {
  const c = pedalSlipCase();
  beforeEach(forgetAnticipated);

  async function answer(nodeKey: string, label: string) {
    const ids = await idsOf(c.versionId, nodeKey, label);
    const result = await executeAction(answerStepAction, { caseId: c.caseId, nodeId: ids.nodeId, optionId: ids.optionId }, c.tech);
    if (!result.ok) throw new Error(JSON.stringify(result));
    return result.data;
  }

  it("every option of the tree's next question and the top suggestions is scored as the engine scores it", async () => {
    const first = await answer("q-what", "Pedals spin forward");
    await anticipateForCase(c.caseId, first.ranking); // alongside what the answer scheduled; either may score an option

    const ctx = (await loadCaseContext(c.caseId))!;
    const tree = await publishedTree(ctx.treeVersionId);
    const answers = answersOf(tree, ctx.steps);
    const questions = likelyNextQuestions(tree, answers, first.ranking);
    expect(questions[0]).toBe(walkPath(tree.dx, answers).current);
    for (const s of first.ranking.suggestions.slice(0, 3)) expect(questions).toContain(s.nodeId);
    expect(questions).not.toContain("q-what");

    let options = 0;
    for (const nodeKey of questions) {
      for (const option of tree.graph.options.filter((o) => o.fromKey === nodeKey)) {
        const next = [...answers, { nodeId: nodeKey, optionId: option.key }];
        const ready = anticipatedRanking(tree, next, ctx.settings);
        expect(ready, `${nodeKey} → ${option.key}`).toEqual(computeRanking(tree.dx, next, ctx.settings));
        expect(Object.isFrozen(ready) && Object.isFrozen(ready!.causes[0])).toBe(true);
        options++;
      }
    }
    expect(options).toBeGreaterThan(3);
    expect(await anticipateForCase(c.caseId, first.ranking)).toBe(0); // all ready: nothing is scored twice
  });

  it("the next answer uses the ranking worked out for it, and stores exactly that", async () => {
    const first = await answer("q-what", "Pedals spin forward");
    await anticipateForCase(c.caseId, first.ranking);
    const ctx = (await loadCaseContext(c.caseId))!;
    const tree = await publishedTree(ctx.treeVersionId);
    const nodeKey = walkPath(tree.dx, answersOf(tree, ctx.steps)).current!;
    const option = tree.graph.options.find((o) => o.fromKey === nodeKey)!;
    const ready = anticipatedRanking(tree, [...answersOf(tree, ctx.steps), { nodeId: nodeKey, optionId: option.key }], ctx.settings);
    expect(ready).toBeDefined();

    const result = await executeAction(answerStepAction, { caseId: c.caseId, nodeId: tree.nodeByKey.get(nodeKey)!.id, optionId: option.id }, c.tech);
    expect(result.ok && result.data.ranking).toBe(ready);
    const stored = await db.select().from(caseSteps).where(eq(caseSteps.caseId, c.caseId)).orderBy(asc(caseSteps.seq));
    expect(stored.at(-1)!.ranking as StoredRanking).toEqual(ready);
  });

  it("other settings or other earlier answers find nothing ready", async () => {
    const first = await answer("q-what", "Pedals spin forward");
    await anticipateForCase(c.caseId, first.ranking);
    const ctx = (await loadCaseContext(c.caseId))!;
    const tree = await publishedTree(ctx.treeVersionId);
    const answers = answersOf(tree, ctx.steps);
    const nodeKey = walkPath(tree.dx, answers).current!;
    const option = tree.graph.options.find((o) => o.fromKey === nodeKey)!;
    const next = [...answers, { nodeId: nodeKey, optionId: option.key }];
    expect(anticipatedRanking(tree, next, ctx.settings)).toBeDefined();
    expect(anticipatedRanking(tree, next, { ...ctx.settings, priorStrength: 25 })).toBeUndefined();
    expect(anticipatedRanking(tree, next, { ...ctx.settings, history: { ...ctx.settings.history, "belt-worn": 99 } })).toBeUndefined();
    const otherFirst = tree.graph.options.find((o) => o.fromKey === "q-what" && o.key !== answers[0].optionId)!;
    expect(anticipatedRanking(tree, [{ nodeId: "q-what", optionId: otherFirst.key }, next[1]], ctx.settings)).toBeUndefined();
  });
});
