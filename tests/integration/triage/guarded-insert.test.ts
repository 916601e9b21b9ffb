import { and, asc, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { caseSteps, cases, settings, trees, treeVersions } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { answerStepAction, answersOf, caseRanking } from "@/lib/triage/answer";
import { loadCaseContext } from "@/lib/triage/context";
import { DIAGNOSIS_SETTINGS_KEY } from "@/lib/triage/dx-settings";
import { appendStep } from "@/lib/triage/step-writes";
import { publishedTree } from "@/lib/triage/tree-cache";
import { sql as pg } from "@/db";
import { db } from "../../support/db";
import { idsOf, pedalSlipCase } from "./helpers";

// The step insert stores a step only while what its ranking was worked out from still holds:
// the case open, the step it followed still the last one, the same shop settings and the same
// likelihood setting of the tree. Each test reads the case, changes one of these behind the
// answer's back, and checks that the insert stores nothing.
describe("the guarded step insert", () => {
  const fx = pedalSlipCase();

  const steps = () => db.select().from(caseSteps).where(eq(caseSteps.caseId, fx.caseId)).orderBy(asc(caseSteps.seq));

  async function answer(nodeKey: string, label: string) {
    const ids = await idsOf(fx.versionId, nodeKey, label);
    const result = await executeAction(answerStepAction, { caseId: fx.caseId, nodeId: ids.nodeId, optionId: ids.optionId }, fx.tech);
    expect(result.ok, JSON.stringify(result)).toBe(true);
  }

  /** The insert of an answer to q-cold as it would be prepared now, run after `meanwhile`. */
  async function insertAfter(meanwhile: () => Promise<unknown>) {
    const ctx = (await loadCaseContext(fx.caseId))!;
    const tree = await publishedTree(ctx.treeVersionId);
    const ids = await idsOf(fx.versionId, "q-cold", "No difference");
    const ranking = caseRanking(tree, [...answersOf(tree, ctx.steps), { nodeId: ids.nodeKey, optionId: ids.optionKey }], ctx);
    await meanwhile();
    return appendStep({ caseId: ctx.id, previous: ctx.steps.at(-1) ?? null, nodeId: ids.nodeId, optionId: ids.optionId, userId: fx.tech.id, ranking, basis: ctx.basis });
  }

  it("stores the step when nothing changed in between", async () => {
    await answer("q-what", "Pedals spin forward");
    const stored = await insertAfter(async () => {});
    expect(stored?.seq).toBe(2);
    expect((await steps()).map((s) => s.seq)).toEqual([1, 2]);
  });

  it("refuses it when the step it followed was undone in between", async () => {
    await answer("q-what", "Pedals spin forward");
    await answer("q-onset", "Suddenly");
    expect(await insertAfter(() => db.delete(caseSteps).where(and(eq(caseSteps.caseId, fx.caseId), eq(caseSteps.seq, 2))))).toBeNull();
    expect((await steps()).map((s) => s.seq)).toEqual([1]);
  });

  it("refuses it when another answer landed in between", async () => {
    await answer("q-what", "Pedals spin forward");
    expect(await insertAfter(() => answer("q-onset", "Gradually"))).toBeNull();
    expect((await steps()).map((s) => s.seq)).toEqual([1, 2]);
  });

  it("waits for an undo that holds the case row, then sees its step gone and refuses", async () => {
    await answer("q-what", "Pedals spin forward");
    await answer("q-onset", "Suddenly");
    let release!: () => void;
    const released = new Promise<void>((resolve) => { release = resolve; });
    let locked!: () => void;
    const lockTaken = new Promise<void>((resolve) => { locked = resolve; });
    // An undo as the undo action runs it: the case row first, then its last step, committed only later.
    const undo = pg.begin(async (tx) => {
      await tx`select id from cases where id = ${fx.caseId} for update`;
      await tx`delete from case_steps where case_id = ${fx.caseId} and seq = 2`;
      locked();
      await released;
    });
    const stored = insertAfter(async () => {
      await lockTaken;
      setTimeout(release, 200); // the insert is waiting on the case row by then
    });
    await undo;
    expect(await stored).toBeNull();
    expect((await steps()).map((s) => s.seq)).toEqual([1]);
  });

  it("refuses it when the case was finished in between", async () => {
    await answer("q-what", "Pedals spin forward");
    expect(await insertAfter(() => db.update(cases).set({ status: "advised" }).where(eq(cases.id, fx.caseId)))).toBeNull();
    expect(await steps()).toHaveLength(1);
  });

  it("refuses it when the shop's diagnosis settings changed in between", async () => {
    await answer("q-what", "Pedals spin forward");
    const weights = { strong: 30, for: 5 };
    try {
      const stored = await insertAfter(() => db.insert(settings).values({ key: DIAGNOSIS_SETTINGS_KEY, value: { weights } })
        .onConflictDoUpdate({ target: settings.key, set: { value: { weights } } }));
      expect(stored).toBeNull();
      expect(await steps()).toHaveLength(1);
    } finally {
      await db.delete(settings).where(eq(settings.key, DIAGNOSIS_SETTINGS_KEY));
    }
  });

  it("refuses it when the tree was switched to learned likelihoods in between", async () => {
    await answer("q-what", "Pedals spin forward");
    const [{ treeId }] = await db.select({ treeId: treeVersions.treeId }).from(treeVersions).where(eq(treeVersions.id, fx.versionId));
    try {
      expect(await insertAfter(() => db.update(trees).set({ likelihoodMode: "learned" }).where(eq(trees.id, treeId)))).toBeNull();
      expect(await steps()).toHaveLength(1);
    } finally {
      await db.update(trees).set({ likelihoodMode: "authored" }).where(eq(trees.id, treeId));
    }
  });
});
