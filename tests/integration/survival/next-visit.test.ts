import { eq } from "drizzle-orm";
import { readFileSync, readdirSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { db, sql as pg } from "@/db";
import { seed } from "@/db/seed";
import { cases } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { saveOutcomeAction, startBenchAction } from "@/lib/outcomes/actions";
import { startCaseAction } from "@/lib/triage/start";
import { createRoleUsers, truncateAll } from "../../support/db";
import { casesWithStaleNextVisit } from "../../support/next-visit-copies";
import { day, demoIds, insertCases, type DemoIds } from "../reports/fixtures";

const F = "orvanta-tessel-2";
const T = { family: F, tree: "pedal-slip" };

/** The migration's backfill statement, run as the migration runner runs it. */
function backfill(): string {
  const dir = path.join(process.cwd(), "db", "migrations");
  const file = readdirSync(dir).find((f) => f.endsWith("_case_next_visit.sql"))!;
  return readFileSync(path.join(dir, file), "utf8").split("--> statement-breakpoint").find((s) => s.includes("UPDATE"))!;
}

describe("the case row's copy of the unit's next visit", () => {
  let ids: DemoIds;
  let users: Awaited<ReturnType<typeof createRoleUsers>>;

  beforeAll(async () => {
    // With the simulated history, whose units come back: every seed writer goes through the trigger.
    await truncateAll();
    await seed({ force: true });
    users = await createRoleUsers();
    ids = await demoIds();
  });

  const copyOf = async (id: number) => {
    const [row] = await db.select({ at: cases.nextVisitAt, causes: cases.nextVisitCauseIds }).from(cases).where(eq(cases.id, id));
    return row;
  };
  const visit = async (id: number) => {
    const [row] = await db.select({ at: cases.createdAt, causes: cases.confirmedCauseIds }).from(cases).where(eq(cases.id, id));
    return row;
  };

  it("is right on the seeded history, where units come back", async () => {
    const [{ n }] = await pg<{ n: number }[]>`select count(*)::int as n from cases where next_visit_at is not null`;
    expect(n).toBeGreaterThan(10);
    expect(await casesWithStaleNextVisit()).toEqual([]);
  });

  it("the migration's backfill writes the same copies", async () => {
    const [before] = await pg<{ n: number }[]>`select count(*)::int as n from cases where next_visit_at is not null`;
    await pg`update cases set next_visit_at = null, next_visit_cause_ids = null`;
    expect((await casesWithStaleNextVisit()).length).toBe(before.n);
    await pg.unsafe(backfill());
    expect(await casesWithStaleNextVisit()).toEqual([]);
  });

  it("follows a booking, a historic visit put in between, confirmed causes, a move and a delete", async () => {
    const [first, second] = await insertCases(ids, [
      { ...T, serial: "NV-1", createdAt: day("2026-01-05"), closedAt: day("2026-01-10"), primary: "owc-cage-broken" },
      { ...T, serial: "NV-1", createdAt: day("2026-03-05"), closedAt: day("2026-03-10"), primary: "belt-worn" },
    ]);
    expect(await copyOf(first)).toEqual(await visit(second));
    expect(await copyOf(second)).toEqual({ at: null, causes: null });

    // Booked from triage: the unit's latest visit now points at it.
    const booked = await executeAction(startCaseAction, {
      callerName: "Returning rider", callerKind: "rider", phone: "0100 000000", email: "", familyId: String(ids.family(F)), serial: "NV-1",
      ridingUse: "road", treeVersionId: String(ids.version("pedal-slip").id),
    }, users.tech);
    expect(booked.ok, JSON.stringify(booked)).toBe(true);
    const third = (booked as { data: { id: number } }).data.id;
    expect(await copyOf(second)).toEqual(await visit(third));
    expect(await casesWithStaleNextVisit()).toEqual([]);

    // An imported old visit between the first two.
    const [between] = await insertCases(ids, [{ ...T, serial: "NV-1", createdAt: day("2026-02-01"), closedAt: day("2026-02-03"), primary: "crank-seal-worn" }]);
    expect(await copyOf(first)).toEqual(await visit(between));
    expect(await copyOf(between)).toEqual(await visit(second));
    expect(await casesWithStaleNextVisit()).toEqual([]);

    // The booked visit's bench outcome, through the real writer: its predecessor copies the causes.
    await db.update(cases).set({ status: "booked_in" }).where(eq(cases.id, third));
    expect((await executeAction(startBenchAction, { caseId: String(third) }, users.tech)).ok).toBe(true);
    const clutch = ids.cause("owc-rollers-worn");
    expect((await executeAction(saveOutcomeAction, { caseId: String(third), labourMinutes: "20", causeId: String(clutch) }, users.tech)).ok).toBe(true);
    expect((await copyOf(second)).causes).toEqual([clutch]);
    expect(await casesWithStaleNextVisit()).toEqual([]);

    // Moved to another serial, then to another family: both units are put right.
    await db.update(cases).set({ serial: "NV-2" }).where(eq(cases.id, between));
    expect(await copyOf(first)).toEqual(await visit(second));
    expect(await copyOf(between)).toEqual({ at: null, causes: null });
    expect(await casesWithStaleNextVisit()).toEqual([]);
    await db.update(cases).set({ serial: "NV-1", familyId: ids.family("orvanta-tessel-3") }).where(eq(cases.id, second));
    expect(await copyOf(first)).toEqual(await visit(third));
    expect(await copyOf(second)).toEqual({ at: null, causes: null });
    expect(await casesWithStaleNextVisit()).toEqual([]);

    // Opened earlier, then without a serial.
    await db.update(cases).set({ createdAt: day("2025-12-01") }).where(eq(cases.id, third));
    expect(await copyOf(third)).toEqual(await visit(first));
    expect(await casesWithStaleNextVisit()).toEqual([]);
    await db.update(cases).set({ serial: "" }).where(eq(cases.id, third));
    expect(await copyOf(third)).toEqual({ at: null, causes: null });
    expect(await copyOf(first)).toEqual({ at: null, causes: null });
    expect(await casesWithStaleNextVisit()).toEqual([]);

    // Deleted: the visit before points past it.
    const [last] = await insertCases(ids, [{ ...T, serial: "NV-1", createdAt: day("2026-04-01"), status: "booked_in" }]);
    const [middle] = await insertCases(ids, [{ ...T, serial: "NV-1", createdAt: day("2026-03-01"), status: "advised" }]);
    expect(await copyOf(first)).toEqual(await visit(middle));
    await db.delete(cases).where(eq(cases.id, middle));
    expect(await copyOf(first)).toEqual(await visit(last));
    expect(await casesWithStaleNextVisit()).toEqual([]);
  });
});
