import { eq } from "drizzle-orm";
import { readFileSync, readdirSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { db, sql as pg } from "@/db";
import { cases } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { reopenCaseAction, saveOutcomeAction, startBenchAction } from "@/lib/outcomes/actions";
import { seed } from "@/db/seed";
import { createRoleUsers, truncateAll } from "../../support/db";
import { casesDisagreeingWithOutcome } from "../../support/outcome-copies";
import { demoIds, insertCases, type DemoIds } from "../reports/fixtures";

/** The statements of a migration that fill its copies in: its UPDATEs, run as the migration runs them. */
function backfillOf(suffix: string): string[] {
  const dir = path.join(process.cwd(), "db", "migrations");
  const file = readdirSync(dir).find((f) => f.endsWith(suffix))!;
  return readFileSync(path.join(dir, file), "utf8").split("--> statement-breakpoint").filter((s) => s.includes("UPDATE"));
}

describe("the case row's copy of its bench outcome", () => {
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
    const [row] = await db.select({
      primary: cases.primaryCauseId, confirmed: cases.confirmedCauseIds, upgrades: cases.fittedUpgrades,
      partIds: cases.partIds, quantities: cases.partQuantities,
    }).from(cases).where(eq(cases.id, caseId));
    return row;
  };
  const save = (extra: Record<string, unknown>) => executeAction(saveOutcomeAction, { caseId: String(caseId), labourMinutes: "30", ...extra }, users.tech);
  const none = { primary: null, confirmed: [], upgrades: [], partIds: [], quantities: [] };

  it("matches the outcome rows on every demo case (history, companion causes, upgrades and parts)", async () => {
    const [{ causes, upgrades, parts }] = await pg<{ causes: number; upgrades: number; parts: number }[]>`
      select count(*) filter (where cardinality(confirmed_cause_ids) > 1)::int as causes,
             count(*) filter (where cardinality(fitted_upgrades) > 0)::int as upgrades,
             count(*) filter (where cardinality(part_ids) > 1)::int as parts
      from cases`;
    expect(causes).toBeGreaterThan(0);
    expect(upgrades).toBeGreaterThan(0);
    expect(parts).toBeGreaterThan(0);
    expect(await casesDisagreeingWithOutcome()).toEqual([]);
  });

  it("follows the outcome as it is saved, edited, closed, reopened and edited again", async () => {
    expect(await stored()).toEqual(none);
    expect((await executeAction(startBenchAction, { caseId: String(caseId) }, users.tech)).ok).toBe(true);

    const clutch = ids.cause("owc-cage-broken");
    const belt = ids.cause("belt-worn");
    const [cage, grease] = [ids.part("owc-uprated"), ids.part("gear-grease")];
    const [low, high] = cage < grease ? [cage, grease] : [grease, cage];
    expect((await save({
      causeId: [String(clutch), String(belt)], primaryCause: String(belt), upgradeKind: ["uprated-clutch", "cable-sleeve"],
      partId: [String(high), String(low)], partQty: ["3", "1"],
    })).ok).toBe(true);
    expect(await stored()).toEqual({
      primary: belt, confirmed: [clutch, belt].sort((a, b) => a - b), upgrades: ["cable-sleeve", "uprated-clutch"],
      partIds: [low, high], quantities: [1, 3],
    });

    expect((await save({ causeId: [String(clutch)], upgradeKind: "uprated-clutch", partId: String(cage), partQty: "2", intent: "close" })).ok).toBe(true);
    const closed = { primary: clutch, confirmed: [clutch], upgrades: ["uprated-clutch"], partIds: [cage], quantities: [2] };
    expect(await stored()).toEqual(closed);

    expect((await executeAction(reopenCaseAction, { caseId: String(caseId), reason: "Noise again on the road test" }, users.senior)).ok).toBe(true);
    expect(await stored()).toEqual(closed);

    // A cause outside the catalogue as the primary one: confirmed causes stay, no primary; no upgrade, no part.
    expect((await save({ causeId: [String(belt)], primaryCause: "other", otherCause: "Bent spindle" })).ok).toBe(true);
    expect(await stored()).toEqual({ ...none, confirmed: [belt] });

    expect((await save({ causeId: "", otherCause: "" })).ok).toBe(true);
    expect(await stored()).toEqual(none);
    expect(await casesDisagreeingWithOutcome()).toEqual([]);
  });

  it("the migrations' backfills write the same copies as the app", async () => {
    const [before] = await pg<{ primary: number; upgrades: number; parts: number }[]>`
      select count(*) filter (where primary_cause_id is not null)::int as primary,
             count(*) filter (where cardinality(fitted_upgrades) > 0)::int as upgrades,
             count(*) filter (where cardinality(part_ids) > 0)::int as parts
      from cases`;
    expect(before.primary).toBeGreaterThan(0);
    await db.update(cases).set({ primaryCauseId: null, confirmedCauseIds: [], fittedUpgrades: [], partIds: [], partQuantities: [] });
    for (const statement of [...backfillOf("_case_confirmed_causes.sql"), ...backfillOf("_case_outcome_copies.sql")]) await pg.unsafe(statement);
    expect(await casesDisagreeingWithOutcome()).toEqual([]);
    const [after] = await pg<{ primary: number; upgrades: number; parts: number }[]>`
      select count(*) filter (where primary_cause_id is not null)::int as primary,
             count(*) filter (where cardinality(fitted_upgrades) > 0)::int as upgrades,
             count(*) filter (where cardinality(part_ids) > 0)::int as parts
      from cases`;
    expect(after).toEqual(before);
  });

  it("leaves the copy as it was when the save is refused", async () => {
    expect((await save({ causeId: String(ids.cause("owc-cage-broken")), upgradeKind: "sealed-screws", partId: String(ids.part("gear-grease")), partQty: "1" })).ok).toBe(true);
    const before = await stored();
    const refused = await save({ causeId: [String(ids.cause("owc-cage-broken")), "999999"], primaryCause: "999999", upgradeKind: "uprated-clutch" });
    expect(refused.ok).toBe(false);
    const unknownPart = await save({ causeId: String(ids.cause("owc-cage-broken")), partId: "999999", partQty: "1" });
    expect(unknownPart.ok).toBe(false);
    expect(await stored()).toEqual(before);
  });
});
