import { inArray } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { cases } from "@/db/schema";
import { causePareto } from "@/lib/reports/pareto";
import { partsDemand } from "@/lib/reports/parts";
import { parseReportFilter } from "@/lib/reports/period";
import { repeatRate } from "@/lib/reports/repeats";
import { resolveScope } from "@/lib/reports/scope";
import { causeTrend, TREND_REST } from "@/lib/reports/trend";
import { resetToDemo } from "../../support/seed";
import { day, demoIds, insertCases, times, type CaseSpec } from "./fixtures";

// A small shop history built by hand. Tessel Gen 2 (F1): 263 closed cases in the first half of
// 2025, 81 of them a broken clutch cage (A); Carrow Gen 1 (F2): 148 closed, 15 controller corrosion (D).
// The counts 81/263 and 15/148 are Newcombe's examples, so the Wilson intervals can be checked
// against his published table.
const F1 = "orvanta-tessel-2";
const F2 = "haldrin-carrow-1";
const A = "owc-cage-broken";
const B = "needle-bearing-water";
const C = "crank-seal-worn";
const D = "controller-corrosion";
const E = "torque-sensor-drift";
const MONTHS = ["2025-01", "2025-02", "2025-03", "2025-04", "2025-05", "2025-06"];
const period = { from: "2025-01-01", to: "2025-06-30" };

/** Spreads cases over the six months: the i-th case of a list closes in month i mod 6. */
function spread(list: CaseSpec[]): CaseSpec[] {
  return list.map((s, i) => ({ ...s, closedAt: day(`${MONTHS[i % 6]}-${String(1 + (i % 27)).padStart(2, "0")}`) }));
}

const f1 = spread([
  ...times(81, { family: F1, tree: "pedal-slip", primary: A, parts: [{ slug: "owc-uprated", quantity: 1 }] }),
  ...times(100, { family: F1, tree: "grinding-noise", primary: B }),
  ...times(82, { family: F1, tree: "water-cutout", primary: C, parts: [{ slug: "crank-seal-double", quantity: 2 }] }),
]);
const f2 = spread([
  ...times(15, { family: F2, tree: "water-cutout", primary: D }),
  ...times(133, { family: F2, tree: "weak-assist", primary: E }),
]);
// None of these may count: not closed, or closed just outside the period.
const ignored: CaseSpec[] = [
  ...times(7, { family: F1, tree: "pedal-slip", status: "on_bench", createdAt: day("2025-03-03"), primary: A, parts: [{ slug: "owc-uprated", quantity: 5 }] }),
  { family: F1, tree: "pedal-slip", status: "booked_in", createdAt: day("2025-02-02") },
  { family: F1, tree: "pedal-slip", status: "advised", createdAt: day("2025-02-02") },
  { family: F1, tree: "pedal-slip", status: "open", createdAt: day("2025-02-02") },
  { family: F1, tree: "pedal-slip", closedAt: new Date("2024-12-31T23:59:59Z"), primary: A },
  { family: F1, tree: "pedal-slip", closedAt: new Date("2025-07-01T00:00:00Z"), primary: A },
];

describe("cause Pareto, trend, parts and repeat rate on a hand-built history", () => {
  let scopeF1: Awaited<ReturnType<typeof resolveScope>>;
  let scopeF2: Awaited<ReturnType<typeof resolveScope>>;
  let scopeAll: Awaited<ReturnType<typeof resolveScope>>;

  beforeAll(async () => {
    await resetToDemo();
    const ids = await demoIds();
    const f1Ids = await insertCases(ids, f1);
    await insertCases(ids, [...f2, ...ignored]);
    // Three of F1's cases are repeat returns of its first one.
    await db.update(cases).set({ repeatOfCaseId: f1Ids[0] }).where(inArray(cases.id, f1Ids.slice(1, 4)));
    scopeF1 = await resolveScope(parseReportFilter({ ...period, family: F1 }));
    scopeF2 = await resolveScope(parseReportFilter({ ...period, family: F2 }));
    scopeAll = await resolveScope(parseReportFilter(period));
  });

  it("counts closed cases by primary cause in Pareto order with cumulative share", async () => {
    const pareto = await causePareto(scopeF1);
    // Hand computation from the definitions: share = n/263, cumulative = running total / 263.
    expect(pareto.total).toBe(263);
    expect(pareto.rows.map((r) => [r.key, r.n])).toEqual([[B, 100], [C, 82], [A, 81]]);
    expect(pareto.rows[0].share).toBeCloseTo(100 / 263, 12);
    expect(pareto.rows.map((r) => r.cumulative)).toEqual([100 / 263, 182 / 263, 1]);
  });

  it("gives each share the Wilson 95 % interval of Newcombe's table", async () => {
    const a = (await causePareto(scopeF1)).rows.find((r) => r.key === A)!;
    // Newcombe, Statistics in Medicine 17 (1998), Table I: 81/263 → Wilson 0.2553–0.3662 (printed to 4 places).
    expect(Math.abs(a.low - 0.2553)).toBeLessThan(1e-4);
    expect(Math.abs(a.high - 0.3662)).toBeLessThan(1e-4);
    const d = (await causePareto(scopeF2)).rows.find((r) => r.key === D)!;
    // Newcombe (1998), Table I: 15/148 → Wilson 0.0624–0.1605.
    expect(d.n).toBe(15);
    expect(Math.abs(d.low - 0.0624)).toBeLessThan(1e-4);
    expect(Math.abs(d.high - 0.1605)).toBeLessThan(1e-4);
  });

  it("without a family filter, counts both families", async () => {
    const pareto = await causePareto(scopeAll);
    // Hand computation: 263 + 148 = 411 closed cases, E 133 first, then B, C, A, D.
    expect(pareto.total).toBe(411);
    expect(pareto.rows.map((r) => [r.key, r.n])).toEqual([[E, 133], [B, 100], [C, 82], [A, 81], [D, 15]]);
  });

  it("ignores open, advised, booked-in and on-bench cases and those closed outside the period", async () => {
    const pareto = await causePareto(scopeF1);
    expect(pareto.rows.find((r) => r.key === A)!.n).toBe(81);
    const parts = await partsDemand(scopeF1);
    // Hand computation: 81 clutches × 1; the 7 on-bench cases' 35 clutches do not count.
    expect(parts.parts.find((p) => p.slug === "owc-uprated")!.total).toBe(81);
  });

  it("trends the top causes per month, with the rest together", async () => {
    const trend = await causeTrend(scopeAll);
    expect(trend.months.map((m) => m.month)).toEqual(MONTHS);
    // Five causes in the data, so all five are their own series and nothing is left for the rest.
    expect(trend.series.map((s) => s.key)).toEqual([E, B, C, A, D]);
    expect(trend.series.some((s) => s.key === TREND_REST)).toBe(false);
    // Hand computation from the fixture: cases of cause B that spread() put in March.
    const bInMarch = [...f1, ...f2].filter((s) => s.primary === B && s.closedAt!.toISOString().startsWith("2025-03")).length;
    expect(trend.months[2][B]).toBe(bInMarch);
    const total = trend.months.reduce((s, m) => s + trend.series.reduce((t, x) => t + Number(m[x.key]), 0), 0);
    expect(total).toBe(411);
  });

  it("sums parts replaced per month", async () => {
    const parts = await partsDemand(scopeF1);
    // Hand computation: 82 seal cases × 2 seals = 164, over six months.
    const seal = parts.parts.find((p) => p.slug === "crank-seal-double")!;
    expect(seal.total).toBe(164);
    expect(seal.perMonth).toBeCloseTo(164 / 6, 12);
    const monthly = parts.months.reduce((s, m) => s + (parts.byMonth[m]["crank-seal-double"] ?? 0), 0);
    expect(monthly).toBe(164);
  });

  it("gives the repeat-return rate with its Wilson interval", async () => {
    const rate = await repeatRate(scopeF1);
    expect(rate.closed).toBe(263);
    expect(rate.repeats).toBe(3);
    expect(rate.rate).toBeCloseTo(3 / 263, 12);
    // Hand computation of Wilson's formula for 3/263, z = 1.959964: centre (3 + z²/2)/(263 + z²).
    const z = 1.959963984540054;
    const centre = (3 + (z * z) / 2) / (263 + z * z);
    const half = (z / (263 + z * z)) * Math.sqrt((3 * 260) / 263 + (z * z) / 4);
    expect(rate.low).toBeCloseTo(centre - half, 12);
    expect(rate.high).toBeCloseTo(centre + half, 12);
    expect(rate.recent).toHaveLength(3);
  });
});
