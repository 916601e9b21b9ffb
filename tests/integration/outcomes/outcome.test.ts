import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { caseEvents, caseOutcomes, cases, outcomeCauses, outcomeParts } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { reopenCaseAction, saveOutcomeAction, startBenchAction } from "@/lib/outcomes/actions";
import { FROZEN_MESSAGE } from "@/lib/outcomes/status";
import { createRoleUsers } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { demoIds, insertCases, type DemoIds } from "../reports/fixtures";

describe("bench outcome: record, close, freeze, reopen", () => {
  let ids: DemoIds;
  let users: Awaited<ReturnType<typeof createRoleUsers>>;
  let caseId: number;

  beforeAll(async () => {
    await resetToDemo();
    users = await createRoleUsers();
    ids = await demoIds();
    [caseId] = await insertCases(ids, [{ family: "orvanta-tessel-2", tree: "pedal-slip", status: "booked_in" }]);
  });

  const form = (extra: Record<string, unknown>) => ({ caseId: String(caseId), labourMinutes: "75", ...extra });

  it("refuses an outcome before the unit is on the bench, then moves it there", async () => {
    const early = await executeAction(saveOutcomeAction, form({ causeId: String(ids.cause("owc-cage-broken")) }), users.tech);
    expect(early.ok).toBe(false);
    if (!early.ok) expect(early.status).toBe(409);
    const moved = await executeAction(startBenchAction, { caseId: String(caseId) }, users.tech);
    expect(moved.ok).toBe(true);
    const [row] = await db.select({ status: cases.status }).from(cases).where(eq(cases.id, caseId));
    expect(row.status).toBe("on_bench");
    const again = await executeAction(startBenchAction, { caseId: String(caseId) }, users.tech);
    expect(again.ok).toBe(false);
  });

  it("explains each bad field", async () => {
    const result = await executeAction(saveOutcomeAction, form({
      causeId: [String(ids.cause("owc-cage-broken")), String(ids.cause("belt-worn"))],
      primaryCause: String(ids.cause("gear-teeth-worn")),
      partId: [String(ids.part("owc-uprated")), String(ids.part("owc-uprated")), String(ids.part("crank-seal-double"))],
      partQty: ["1", "2", "0"],
      labourMinutes: "12.5",
    }), users.tech);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.status).toBe(400);
    expect(result.fieldErrors).toMatchObject({
      primaryCause: "The primary cause must be one of the confirmed causes.",
      "partId.1": "This part is listed twice; add the quantities up in one row.",
      "partQty.2": "Between 1 and 99.",
      labourMinutes: "Use whole minutes.",
    });
  });

  it("closing needs a confirmed cause", async () => {
    const result = await executeAction(saveOutcomeAction, form({ intent: "close", causeId: "" }), users.tech);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.fieldErrors?.causeId).toBe("Record the confirmed cause before closing the case.");
  });

  it("saves causes with one primary, parts with quantities, labour and notes", async () => {
    const result = await executeAction(saveOutcomeAction, form({
      causeId: [String(ids.cause("owc-cage-broken")), String(ids.cause("belt-worn"))],
      primaryCause: String(ids.cause("owc-cage-broken")),
      partId: [String(ids.part("owc-uprated")), ""],
      partQty: ["1", "1"],
      upgrades: "Uprated clutch",
      notes: "Cage split at two pockets.",
    }), users.tech);
    expect(result.ok).toBe(true);
    const causes = await db.select().from(outcomeCauses).where(eq(outcomeCauses.caseId, caseId));
    expect(causes.map((c) => [c.causeId, c.primary]).sort()).toEqual([[ids.cause("belt-worn"), false], [ids.cause("owc-cage-broken"), true]].sort());
    expect(await db.select({ partId: outcomeParts.partId, quantity: outcomeParts.quantity }).from(outcomeParts).where(eq(outcomeParts.caseId, caseId)))
      .toEqual([{ partId: ids.part("owc-uprated"), quantity: 1 }]);
    const [o] = await db.select().from(caseOutcomes).where(eq(caseOutcomes.caseId, caseId));
    expect(o).toMatchObject({ labourMinutes: 75, upgrades: "Uprated clutch", notes: "Cage split at two pockets.", recordedBy: users.tech.id });
  });

  it("a cause not in the catalogue can be the primary one", async () => {
    const result = await executeAction(saveOutcomeAction, form({
      causeId: String(ids.cause("belt-worn")), primaryCause: "other", otherCause: "Foreign body in the gear train",
    }), users.tech);
    expect(result.ok).toBe(true);
    const causes = await db.select().from(outcomeCauses).where(eq(outcomeCauses.caseId, caseId));
    expect(causes.map((c) => c.primary)).toEqual([false]);
    const missing = await executeAction(saveOutcomeAction, form({ primaryCause: "other", otherCause: "" }), users.tech);
    expect(!missing.ok && missing.fieldErrors?.otherCause).toBe("Describe the cause that is not in the catalogue.");
  });

  it("save and close freezes the outcome", async () => {
    const result = await executeAction(saveOutcomeAction, form({ intent: "close", causeId: String(ids.cause("owc-cage-broken")) }), users.tech);
    expect(result.ok).toBe(true);
    const [row] = await db.select({ status: cases.status, closedAt: cases.closedAt }).from(cases).where(eq(cases.id, caseId));
    expect(row.status).toBe("closed");
    expect(row.closedAt).toBeInstanceOf(Date);
    const edit = await executeAction(saveOutcomeAction, form({ causeId: String(ids.cause("belt-worn")) }), users.senior);
    expect(edit.ok).toBe(false);
    if (!edit.ok) {
      expect(edit.status).toBe(409);
      expect(edit.error).toBe(FROZEN_MESSAGE);
    }
    const [primary] = await db.select().from(outcomeCauses).where(and(eq(outcomeCauses.caseId, caseId), eq(outcomeCauses.primary, true)));
    expect(primary.causeId).toBe(ids.cause("owc-cage-broken"));
  });

  it("only a senior mechanic or admin reopens, with a reason, and the reopening is recorded", async () => {
    const byTech = await executeAction(reopenCaseAction, { caseId: String(caseId), reason: "Wrong cause recorded" }, users.tech);
    expect(!byTech.ok && byTech.status).toBe(403);
    const noReason = await executeAction(reopenCaseAction, { caseId: String(caseId), reason: " " }, users.senior);
    expect(!noReason.ok && noReason.fieldErrors?.reason).toMatch(/Say why/);
    const reopened = await executeAction(reopenCaseAction, { caseId: String(caseId), reason: "Customer reports the same click" }, users.senior);
    expect(reopened.ok).toBe(true);
    const [row] = await db.select({ status: cases.status, closedAt: cases.closedAt }).from(cases).where(eq(cases.id, caseId));
    expect(row).toEqual({ status: "on_bench", closedAt: null });
    const events = await db.select().from(caseEvents).where(and(eq(caseEvents.caseId, caseId), eq(caseEvents.kind, "reopened")));
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({ fromStatus: "closed", toStatus: "on_bench", byUserId: users.senior.id, note: "Customer reports the same click" });
    const edit = await executeAction(saveOutcomeAction, form({ causeId: String(ids.cause("belt-worn")) }), users.tech);
    expect(edit.ok).toBe(true);
  });
});
