import { eq } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it } from "vitest";
import { cases } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import type { SessionUser } from "@/lib/auth/session-user";
import { answerStepAction } from "@/lib/triage/answer";
import { undoStepAction } from "@/lib/triage/undo";
import { loadGraph } from "@/lib/trees/graph";
import { countRows, createUser, db } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { idsOf, publishedVersion, startTestCase } from "./helpers";

describe("answers the server refuses", () => {
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

  async function refused(input: Record<string, unknown>) {
    const before = await countRows("case_steps");
    const result = await executeAction(answerStepAction, input, tech);
    expect(await countRows("case_steps")).toBe(before);
    expect(result.ok).toBe(false);
    return result.ok ? { status: 200, error: "" } : result;
  }

  it("an option id that does not exist", async () => {
    const q = await idsOf(versionId, "q-what");
    const r = await refused({ caseId, nodeId: q.nodeId, optionId: 987654 });
    expect(r.status).toBe(422);
    expect(r.error).toBe("That answer is not an option anywhere in this case's tree.");
  });

  it("an option that belongs to another question of the same tree", async () => {
    const what = await idsOf(versionId, "q-what");
    const onset = await idsOf(versionId, "q-onset", "Suddenly");
    const r = await refused({ caseId, nodeId: what.nodeId, optionId: onset.optionId });
    expect(r.status).toBe(422);
    expect(r.error).toBe("The answer “Suddenly” belongs to “Sudden or gradual?”, not to “What happens exactly?”.");
  });

  it("a question and option from another tree", async () => {
    const other = await idsOf(await publishedVersion("no-power"), "q-display");
    const r = await refused({ caseId, nodeId: other.nodeId, optionId: other.optionId });
    expect(r.status).toBe(422);
    expect(r.error).toBe("That question is not part of the tree this case is walked on.");
  });

  it("a cause node instead of a question", async () => {
    const graph = (await loadGraph(versionId))!;
    const causeNode = graph.nodes.find((n) => n.key === "c-owc-cage")!;
    const q = await idsOf(versionId, "q-what");
    const r = await refused({ caseId, nodeId: causeNode.id, optionId: q.optionId });
    expect(r.status).toBe(422);
    expect(r.error).toBe("“Clutch cage broken” is a cause node; only questions and checks take an answer.");
  });

  it("an answer on a closed case", async () => {
    await db.update(cases).set({ status: "closed", closedAt: new Date() }).where(eq(cases.id, caseId));
    const q = await idsOf(versionId, "q-what");
    const r = await refused({ caseId, nodeId: q.nodeId, optionId: q.optionId });
    expect(r.status).toBe(409);
    expect(r.error).toMatch(/^Case [A-Z]{2}-\d{4}-\d{4} is closed; its triage is finished/);
    const undo = await executeAction(undoStepAction, { caseId, seq: 1 }, tech);
    expect(!undo.ok && undo.status).toBe(409);
  });

  it("a case that does not exist, and input that is not a number", async () => {
    const q = await idsOf(versionId, "q-what");
    expect((await refused({ caseId: 999999, nodeId: q.nodeId, optionId: q.optionId })).status).toBe(404);
    const garbage = await refused({ caseId, nodeId: "first", optionId: "" });
    expect(garbage.status).toBe(400);
  });
});
