import { eq, sql } from "drizzle-orm";
import { readFileSync, readdirSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { db, sql as pg } from "@/db";
import { cases } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { reopenCaseAction, saveOutcomeAction, startBenchAction } from "@/lib/outcomes/actions";
import { seed } from "@/db/seed";
import { createRoleUsers, truncateAll } from "../../support/db";
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
    // With the simulated history: its outcomes and the companion causes added to them are written by the seed.
    await truncateAll();
    await seed({ force: true });
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
    const [{ n }] = await pg<{ n: number }[]>`select count(*)::int as n from cases where cardinality(confirmed_cause_ids) > 1`;
    expect(n).toBeGreaterThan(0);
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

  it("the migration's backfill writes the same copy as the app", async () => {
    const dir = path.join(process.cwd(), "db", "migrations");
    const file = readdirSync(dir).find((f) => f.endsWith("_case_confirmed_causes.sql"))!;
    const backfill = readFileSync(path.join(dir, file), "utf8").split("--> statement-breakpoint").find((s) => s.includes("UPDATE"))!;
    const [{ n }] = await pg<{ n: number }[]>`select count(*)::int as n from cases where primary_cause_id is not null`;
    expect(n).toBeGreaterThan(0);
    await db.update(cases).set({ primaryCauseId: null, confirmedCauseIds: [] });
    await pg.unsafe(backfill);
    expect(await disagreeing()).toEqual([]);
    const [again] = await pg<{ n: number }[]>`select count(*)::int as n from cases where primary_cause_id is not null`;
    expect(again.n).toBe(n);
  });

  it("leaves the copy as it was when the save is refused", async () => {
    const before = await stored();
    const refused = await save({ causeId: [String(ids.cause("owc-cage-broken")), "999999"], primaryCause: "999999" });
    expect(refused.ok).toBe(false);
    expect(await stored()).toEqual(before);
  });
});
