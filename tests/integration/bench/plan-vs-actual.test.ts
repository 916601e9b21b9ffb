import { eq, inArray } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { assemblies, caseOutcomes, causeLocations, causes, motorFamilies } from "@/db/schema";
import { plannedTeardownMissing, storePlannedTeardown } from "@/lib/bench/planned-teardown";
import { planVsActual } from "@/lib/bench/plan-vs-actual";
import { parseReportFilter } from "@/lib/reports/period";
import { resolveScope } from "@/lib/reports/scope";
import { resetToDemo } from "../../support/seed";
import { day, demoIds, insertCases } from "../reports/fixtures";

const PERIOD = { from: "2019-01-01", to: "2019-12-31" };
const HOUSING = "owc-cage-broken";
const GEARBOX = "owc-rollers-worn";
const UNLOCATED = "belt-worn";

// A family of three stages (unit → housing, 20 min to open → gearbox, 10 min) with one cause in the
// housing (5 min) and one in the gearbox (4 min); a third cause has no location and is inspected in
// the unit as received at its catalogue minutes, set here to 10.
describe("plan against recorded labour (the reports page's bench section)", () => {
  let familyId: number;
  let caseIds: number[];
  let housingId: number;

  beforeAll(async () => {
    await resetToDemo();
    const [other] = await db.select({ makerId: motorFamilies.makerId }).from(motorFamilies).limit(1);
    [{ id: familyId }] = await db.insert(motorFamilies).values({ makerId: other.makerId, slug: "plan-test", name: "Plan Test", generation: "Gen 1" }).returning({ id: motorFamilies.id });
    const [unit] = await db.insert(assemblies).values({ familyId, slug: "unit", name: "Unit", parentId: null, openMinutes: 0 }).returning({ id: assemblies.id });
    const [housing] = await db.insert(assemblies).values({ familyId, slug: "housing", name: "Housing", parentId: unit.id, openMinutes: 20, position: 1 }).returning({ id: assemblies.id });
    const [gearbox] = await db.insert(assemblies).values({ familyId, slug: "gearbox", name: "Gearbox", parentId: housing.id, openMinutes: 10, position: 2 }).returning({ id: assemblies.id });
    housingId = housing.id;
    const ids = await demoIds();
    await db.insert(causeLocations).values([
      { familyId, causeId: ids.cause(HOUSING), assemblyId: housing.id, inspectMinutes: 5 },
      { familyId, causeId: ids.cause(GEARBOX), assemblyId: gearbox.id, inspectMinutes: 4 },
    ]);
    await db.update(causes).set({ inspectMinutes: 10 }).where(eq(causes.slug, UNLOCATED));

    const closedAt = day("2019-06-01");
    caseIds = await insertCases(ids, [
      { family: "plan-test", tree: "pedal-slip", closedAt, primary: HOUSING, ranking: { [HOUSING]: 0.6, [GEARBOX]: 0.3, unlisted: 0.1 } },
      { family: "plan-test", tree: "pedal-slip", closedAt, primary: GEARBOX, ranking: { [HOUSING]: 0.1, [GEARBOX]: 0.8, [UNLOCATED]: 0.05, unlisted: 0.05 } },
      // Left out: no ranking (an imported record), and no labour recorded.
      { family: "plan-test", tree: "pedal-slip", closedAt, primary: HOUSING, ranking: null },
      { family: "plan-test", tree: "pedal-slip", closedAt, primary: HOUSING, ranking: { [HOUSING]: 1 } },
      // Another family's case, and this family's case closed outside the period.
      { family: "orvanta-kestrum-1", tree: "pedal-slip", closedAt, primary: HOUSING, ranking: { [HOUSING]: 1 } },
      { family: "plan-test", tree: "pedal-slip", closedAt: day("2020-02-01"), primary: HOUSING, ranking: { [HOUSING]: 1 } },
    ]);
    const labour = [40, 50, 70, 0, 30, 90];
    for (const [i, id] of caseIds.entries()) await db.update(caseOutcomes).set({ labourMinutes: labour[i] }).where(eq(caseOutcomes.caseId, id));
    expect(await db.select().from(caseOutcomes).where(inArray(caseOutcomes.caseId, caseIds))).toHaveLength(6);
  });

  it("is the median expected teardown minutes of each case's bench plan against the median labour recorded", async () => {
    const rows = await planVsActual(await resolveScope(parseReportFilter({ ...PERIOD, family: "plan-test" })));
    // Worked by hand: the order by bottom-up P-over-C (Ottosen & Jensen, "The cost of
    // troubleshooting cost clusters with inside information", UAI 2010), its expected minutes as
    // Σ P(reached) × minutes (Heckerman, Breese & Rommelse 1995).
    // Case 1: the housing cause first (open the
    // housing, 20 + 5 = 25 min, always reached), then the gearbox cause (open the gearbox,
    // 10 + 4 = 14 min, reached with 1 − 0.6 = 0.4): 25 + 5.6 = 30.6.
    // Case 2: the gearbox cause first (20 + 10 + 4 = 34 min), then the housing cause (5 min,
    // reached with 0.2), then the unlocated one in the unit as received (10 min, reached with
    // 0.1): 34 + 1 + 1 = 36. Median of 30.6 and 36 is 33.3.
    expect(rows).toEqual([{ familyId, family: "Plan Test Gen 1", cases: 2, planned: expect.closeTo(33.3, 9), recorded: 45 }]);
  });

  it("lists each family in scope by name when no family is chosen", async () => {
    const rows = await planVsActual(await resolveScope(parseReportFilter(PERIOD)));
    expect(rows.map((r) => [r.family, r.cases, r.recorded])).toEqual([
      ["Orvanta Kestrum Gen 1", 1, 30],
      ["Plan Test Gen 1", 2, 45],
    ]);
    // One cause in the housing of the demo family's unit: its plan is that stage's opening and the cause's inspection.
    expect(rows[0].planned).toBeGreaterThan(0);
  });

  it("keeps the plan of the day the outcome was saved when the stages are edited later, and plans again when it is saved again", async () => {
    const scope = await resolveScope(parseReportFilter({ ...PERIOD, family: "plan-test" }));
    await db.update(assemblies).set({ openMinutes: 120 }).where(eq(assemblies.id, housingId));
    expect((await planVsActual(scope))[0].planned).toBeCloseTo(33.3, 9);
    // Saved again (say, reopened and closed): case 1 is now 120 + 5 + 0.4 × 14 = 130.6 and case 2
    // 120 + 10 + 4 + 0.2 × 5 + 0.1 × 10 = 136, median 133.3.
    await db.transaction((tx) => storePlannedTeardown(tx, caseIds.slice(0, 2)));
    expect((await planVsActual(scope))[0].planned).toBeCloseTo(133.3, 9);
    await db.update(assemblies).set({ openMinutes: 20 }).where(eq(assemblies.id, housingId));
    await db.transaction((tx) => storePlannedTeardown(tx, caseIds.slice(0, 2)));
  });

  it("leaves an outcome without a final ranking unplanned, and plans on start-up the outcomes saved before the figure was stored", async () => {
    const stored = async () => (await db.select({ id: caseOutcomes.caseId, planned: caseOutcomes.plannedTeardownMinutes }).from(caseOutcomes)
      .where(inArray(caseOutcomes.caseId, caseIds))).sort((a, b) => a.id - b.id).map((r) => r.planned);
    const before = await stored();
    expect(before[2]).toBeNull();
    expect(before.filter((p) => p === null)).toHaveLength(1);
    await db.update(caseOutcomes).set({ plannedTeardownMinutes: null }).where(inArray(caseOutcomes.caseId, caseIds));
    expect(await plannedTeardownMissing()).toBeGreaterThanOrEqual(5);
    expect(await stored()).toEqual(before);
    expect(await plannedTeardownMissing()).toBe(0);
  });

  it("saves the outcome of a case whose ranking the planner refuses, without a planned figure", async () => {
    const ids = await demoIds();
    const [odd] = await insertCases(ids, [{ family: "plan-test", tree: "pedal-slip", closedAt: day("2019-07-01"), primary: HOUSING, ranking: { [HOUSING]: 0.9, [GEARBOX]: 0.9 } }]);
    const [row] = await db.select({ planned: caseOutcomes.plannedTeardownMinutes }).from(caseOutcomes).where(eq(caseOutcomes.caseId, odd));
    expect(row.planned).toBeNull();
  });
});
