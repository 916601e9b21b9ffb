import { and, asc, eq } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { cases, caseSteps, settings } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import type { SessionUser } from "@/lib/auth/session-user";
import { answerStepAction } from "@/lib/triage/answer";
import { cachedCase } from "@/lib/triage/context-cache";
import { DIAGNOSIS_SETTINGS_KEY } from "@/lib/triage/dx-settings";
import { familyHistory } from "@/lib/triage/history";
import type { StoredRanking } from "@/lib/triage/ranking-types";
import { scoreCauses, type DxAnswer } from "@/lib/diagnosis";
import { loadGraph, toDxTree } from "@/lib/trees/graph";
import { createUser, db } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { idsOf, publishedVersion, startTestCase } from "./helpers";

// The answer path keeps open cases it has just read or written in memory. Whatever changes behind
// its back (another process, a direct write) must never produce a step computed from stale facts.
describe("answering a case this process remembers", () => {
  let tech: SessionUser;
  let versionId: number;
  let caseId: number;
  beforeAll(async () => {
    await resetToDemo();
    tech = await createUser("tech");
    versionId = await publishedVersion("pedal-slip");
  });
  beforeEach(async () => {
    caseId = (await startTestCase(tech)).id;
  });

  async function answer(nodeKey: string, label: string) {
    const ids = await idsOf(versionId, nodeKey, label);
    const result = await executeAction(answerStepAction, { caseId, nodeId: ids.nodeId, optionId: ids.optionId }, tech);
    expect(result.ok, JSON.stringify(result)).toBe(true);
    return { nodeId: ids.nodeKey, optionId: ids.optionKey } satisfies DxAnswer;
  }
  const steps = () => db.select().from(caseSteps).where(eq(caseSteps.caseId, caseId)).orderBy(asc(caseSteps.seq));
  async function expected(answers: DxAnswer[], extra: Record<string, unknown> = {}) {
    const history = await familyHistory((await db.select().from(cases).where(eq(cases.id, caseId)))[0].familyId);
    return scoreCauses(toDxTree((await loadGraph(versionId))!), answers, { history, ...extra }).causes;
  }

  it("a step removed behind its back: the next answer follows what is stored, not what was remembered", async () => {
    const first = await answer("q-what", "Pedals spin forward");
    await answer("q-onset", "Suddenly");
    expect(cachedCase(caseId)?.steps).toHaveLength(2);
    await db.delete(caseSteps).where(and(eq(caseSteps.caseId, caseId), eq(caseSteps.seq, 2))); // as another server process's undo would
    const third = await answer("q-cold", "No difference");
    const stored = await steps();
    expect(stored.map((s) => s.seq)).toEqual([1, 2]);
    expect((stored[1].ranking as StoredRanking).causes).toEqual(await expected([first, third]));
  });

  it("a step added behind its back: the answer lands after it", async () => {
    const first = await answer("q-what", "Pedals spin forward");
    const other = await idsOf(versionId, "q-onset", "Gradually");
    const [s1] = await steps();
    await db.insert(caseSteps).values({ caseId, seq: 2, nodeId: other.nodeId, optionId: other.optionId, answeredBy: tech.id, ranking: s1.ranking });
    const cold = await answer("q-cold", "No difference");
    const stored = await steps();
    expect(stored.map((s) => s.seq)).toEqual([1, 2, 3]);
    expect((stored[2].ranking as StoredRanking).causes).toEqual(await expected([first, { nodeId: other.nodeKey, optionId: other.optionKey }, cold]));
  });

  it("the shop's settings changed behind its back: the step is scored with the new ones", async () => {
    const first = await answer("q-what", "Pedals spin forward");
    const weights = { strong: 30, for: 5 };
    await db.insert(settings).values({ key: DIAGNOSIS_SETTINGS_KEY, value: { weights } })
      .onConflictDoUpdate({ target: settings.key, set: { value: { weights } } });
    try {
      const second = await answer("q-onset", "Suddenly");
      const last = (await steps()).at(-1)!.ranking as StoredRanking;
      expect(last.causes).toEqual(await expected([first, second], { weights }));
      expect(last.causes).not.toEqual(await expected([first, second]));
    } finally {
      await db.delete(settings).where(eq(settings.key, DIAGNOSIS_SETTINGS_KEY));
    }
  });

  it("the case finished behind its back: the answer is refused and nothing is written", async () => {
    await answer("q-what", "Pedals spin forward");
    await db.update(cases).set({ status: "advised" }).where(eq(cases.id, caseId));
    const ids = await idsOf(versionId, "q-onset", "Suddenly");
    const result = await executeAction(answerStepAction, { caseId, nodeId: ids.nodeId, optionId: ids.optionId }, tech);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.status).toBe(409);
    expect(await steps()).toHaveLength(1);
    expect(cachedCase(caseId)).toBeNull();
  });
});
