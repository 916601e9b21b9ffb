import { eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { cases } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { reopenCaseAction, saveOutcomeAction, startBenchAction } from "@/lib/outcomes/actions";
import { createRoleUsers } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { demoIds, insertCases, type DemoIds } from "../reports/fixtures";

/** The case rows that disagree with their own outcome_causes (the copy follow-up reads). */
async function disagreeing(): Promise<number[]> {
  const rows = await db.execute<{ id: number }>(sql`
    select c.id from cases c
    where c.primary_cause_id is distinct from (select oc.cause_id from outcome_causes oc where oc.case_id = c.id and oc.is_primary)
       or c.confirmed_cause_ids <> coalesce((select array_agg(oc.cause_id order by oc.cause_id) from outcome_causes oc where oc.case_id = c.id), '{}')`);
  return rows.map((r) => r.id);
}

describe("the case row's copy of its confirmed causes", () => {
  let ids: DemoIds;
  let users: Awaited<ReturnType<typeof createRoleUsers>>;
  let caseId: number;

  beforeAll(async () => {
    await resetToDemo();
    users = await createRoleUsers();
    ids = await demoIds();
    [caseId] = await insertCases(ids, [{ family: "orvanta-tessel-2", tree: "pedal-slip", serial: "CC-1", status: "booked_in" }]);
  });

  const stored = async () => {
    const [row] = await db.select({ primary: cases.primaryCauseId, confirmed: cases.confirmedCauseIds }).from(cases).where(eq(cases.id, caseId));
    return row;
  };
  const save = (extra: Record<string, unknown>) => executeAction(saveOutcomeAction, { caseId: String(caseId), labourMinutes: "30", ...extra }, users.tech);

  it("matches outcome_causes on every demo case (history and companion causes)", async () => {
    expect(await disagreeing()).toEqual([]);
  });

  it("follows the outcome as it is saved, edited, closed, reopened and edited again", async () => {
    expect(await stored()).toEqual({ primary: null, confirmed: [] });
    expect((await executeAction(startBenchAction, { caseId: String(caseId) }, users.tech)).ok).toBe(true);

    const clutch = ids.cause("owc-cage-broken");
    const belt = ids.cause("belt-worn");
    expect((await save({ causeId: [String(clutch), String(belt)], primaryCause: String(belt) })).ok).toBe(true);
    expect(await stored()).toEqual({ primary: belt, confirmed: [clutch, belt].sort((a, b) => a - b) });

    expect((await save({ causeId: [String(clutch)], intent: "close" })).ok).toBe(true);
    expect(await stored()).toEqual({ primary: clutch, confirmed: [clutch] });

    expect((await executeAction(reopenCaseAction, { caseId: String(caseId), reason: "Noise again on the road test" }, users.senior)).ok).toBe(true);
    expect(await stored()).toEqual({ primary: clutch, confirmed: [clutch] });

    // A cause outside the catalogue as the primary one: confirmed causes stay, no primary.
    expect((await save({ causeId: [String(belt)], primaryCause: "other", otherCause: "Bent spindle" })).ok).toBe(true);
    expect(await stored()).toEqual({ primary: null, confirmed: [belt] });

    expect((await save({ causeId: "", otherCause: "" })).ok).toBe(true);
    expect(await stored()).toEqual({ primary: null, confirmed: [] });
    expect(await disagreeing()).toEqual([]);
  });

  it("leaves the copy as it was when the save is refused", async () => {
    const before = await stored();
    const refused = await save({ causeId: [String(ids.cause("owc-cage-broken")), "999999"], primaryCause: "999999" });
    expect(refused.ok).toBe(false);
    expect(await stored()).toEqual(before);
  });
});
