import { asc, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { caseEvents, cases, caseSteps, mailOutbox } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import type { SessionUser } from "@/lib/auth/session-user";
import { answerStepAction } from "@/lib/triage/answer";
import { finishCaseAction } from "@/lib/triage/finish";
import { finalRankingOf, type StoredRanking } from "@/lib/triage/ranking-types";
import { saveNotesAction } from "@/lib/triage/notes";
import { startCaseAction } from "@/lib/triage/start";
import { countRows, createUser, db } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { familyId, idsOf, publishedVersion, startTestCase } from "./helpers";

describe("starting a case", () => {
  let tech: SessionUser;
  beforeAll(async () => {
    await resetToDemo();
    tech = await createUser("tech");
  });

  it("gets a reference of the shop's letters, year-month and a sequence, unique under concurrent starts", async () => {
    const started = await Promise.all(Array.from({ length: 6 }, () => startTestCase(tech)));
    const refs = started.map((s) => s.reference);
    expect(new Set(refs).size).toBe(6);
    const now = new Date();
    const yymm = `${String(now.getUTCFullYear() % 100).padStart(2, "0")}${String(now.getUTCMonth() + 1).padStart(2, "0")}`;
    // "WD": the first letters of the demo workshop's first two words.
    for (const r of refs) expect(r).toMatch(new RegExp(`^WD-${yymm}-\\d{4}$`));
    expect(refs.map((r) => Number(r.slice(-4))).sort((a, b) => a - b)).toEqual([1, 2, 3, 4, 5, 6]);
  });

  it("a bad phone number or e-mail address gets a field message and writes nothing", async () => {
    const before = await countRows("cases");
    const base = { callerName: "Ivo Marsh", callerKind: "dealer", familyId: await familyId("haldrin-carrow-1"), ridingUse: "cargo", treeVersionId: await publishedVersion("no-power") };
    const badPhone = await executeAction(startCaseAction, { ...base, phone: "call me maybe", email: "" }, tech);
    expect(!badPhone.ok && badPhone.fieldErrors?.phone).toBe("Enter a phone number of 6 to 15 digits; spaces, dashes and a leading + are fine.");
    const badMail = await executeAction(startCaseAction, { ...base, phone: "", email: "ivo@" }, tech);
    expect(!badMail.ok && badMail.fieldErrors?.email).toBe("That is not an e-mail address (it needs a name, an @ and a domain).");
    const neither = await executeAction(startCaseAction, { ...base, phone: "", email: "" }, tech);
    expect(!neither.ok && neither.fieldErrors?.phone).toMatch(/phone number or an e-mail address/);
    const draftTree = await executeAction(startCaseAction, { ...base, phone: "0123 456789", email: "", treeVersionId: 99999 }, tech);
    expect(!draftTree.ok && draftTree.fieldErrors?.treeVersionId).toBe("Pick one of the published trees listed.");
    expect(await countRows("cases")).toBe(before);
  });

  it("records who started it, the tree version and an opening event", async () => {
    const { id } = await startTestCase(tech);
    const [row] = await db.select().from(cases).where(eq(cases.id, id));
    expect(row.status).toBe("open");
    expect(row.technicianId).toBe(tech.id);
    expect(row.treeVersionId).toBe(await publishedVersion("pedal-slip"));
    expect(row.symptom).toBe("Pedals slip or no drive");
    const events = await db.select().from(caseEvents).where(eq(caseEvents.caseId, id));
    expect(events.map((e) => e.kind)).toEqual(["opened"]);
  });
});

describe("finishing a case", () => {
  let tech: SessionUser;
  let versionId: number;
  beforeAll(async () => {
    await resetToDemo();
    tech = await createUser("tech");
    versionId = await publishedVersion("pedal-slip");
  });

  async function answer(caseId: number, nodeKey: string, label: string) {
    const ids = await idsOf(versionId, nodeKey, label);
    const r = await executeAction(answerStepAction, { caseId, nodeId: ids.nodeId, optionId: ids.optionId }, tech);
    expect(r.ok).toBe(true);
  }

  it("booked in: stores the final ranking, quote, bench plan, what to send, and queues the e-mail with it", async () => {
    const { id } = await startTestCase(tech);
    await answer(id, "q-what", "Pedals spin forward");
    await answer(id, "q-strike", "Yes");
    const result = await executeAction(finishCaseAction, { caseId: id, outcome: "booked_in", send: "unit_battery", advice: "Asked to pack the crank arms too." }, tech);
    expect(result.ok, JSON.stringify(result)).toBe(true);

    const [row] = await db.select().from(cases).where(eq(cases.id, id));
    const [last] = await db.select().from(caseSteps).where(eq(caseSteps.caseId, id)).orderBy(asc(caseSteps.seq)).offset(1);
    expect(row.status).toBe("booked_in");
    expect(row.triagedAt).toBeInstanceOf(Date);
    expect(row.finalRanking).toEqual(finalRankingOf(last.ranking as StoredRanking));
    expect(row.quoteLowCents).toBeGreaterThan(0);
    expect(row.quoteHighCents!).toBeGreaterThanOrEqual(row.quoteLowCents!);
    expect(row.benchPlan?.order[0]).toBeTruthy();
    expect(row.whatToSend).toMatch(/dangerous goods/);

    const mail = await db.select().from(mailOutbox).where(eq(mailOutbox.caseId, id));
    expect(mail).toHaveLength(1);
    expect(mail[0].toAddress).toBe("fenna@example.test");
    expect(mail[0].status).toBe("queued");
    expect(mail[0].subject).toBe(`${row.reference}: your Orvanta Tessel Gen 2 drive unit is booked in`);
    expect(mail[0].textBody).toMatch(/PLEASE STOP RIDING/);
    expect(mail[0].textBody).toMatch(/Rough quote/i);
    expect(mail[0].htmlBody).toMatch(/<h3>How to send the unit<\/h3>/);
    const events = await db.select().from(caseEvents).where(eq(caseEvents.caseId, id)).orderBy(asc(caseEvents.id));
    expect(events.map((e) => [e.kind, e.fromStatus, e.toStatus])).toEqual([["opened", null, "open"], ["booked_in", "open", "booked_in"], ["mail_queued", null, null]]);

    // Finished means finished: no more answers, no second finish.
    const again = await executeAction(finishCaseAction, { caseId: id, outcome: "advised", advice: "x" }, tech);
    expect(!again.ok && again.status).toBe(409);
    expect(await db.select().from(mailOutbox).where(eq(mailOutbox.caseId, id))).toHaveLength(1);
  });

  it("advised without an e-mail address: no message, advice kept on the event", async () => {
    const { id } = await startTestCase(tech, { email: "" });
    const missing = await executeAction(finishCaseAction, { caseId: id, outcome: "advised", advice: "" }, tech);
    expect(!missing.ok && missing.fieldErrors?.advice).toBe("Write down what you advised.");
    const result = await executeAction(finishCaseAction, { caseId: id, outcome: "advised", advice: "Rear freehub; sent to their bike shop." }, tech);
    expect(result.ok && result.data.mailQueued).toBe(false);
    const [row] = await db.select().from(cases).where(eq(cases.id, id));
    expect(row.status).toBe("advised");
    expect(row.quoteLowCents).toBeNull();
    expect(row.finalRanking?.unlisted).toBeGreaterThan(0);
    expect(await db.select().from(mailOutbox).where(eq(mailOutbox.caseId, id))).toHaveLength(0);
  });

  it("notes save, and a lead may not save them", async () => {
    const { id } = await startTestCase(tech);
    const ok = await executeAction(saveNotesAction, { caseId: id, notes: "Rider on a rental fleet bike." }, tech);
    expect(ok.ok).toBe(true);
    const lead = await createUser("lead");
    const refused = await executeAction(saveNotesAction, { caseId: id, notes: "changed" }, lead);
    expect(!refused.ok && refused.status).toBe(403);
    const [row] = await db.select({ notes: cases.notes }).from(cases).where(eq(cases.id, id));
    expect(row.notes).toBe("Rider on a rental fleet bike.");
  });
});
