import { beforeAll, describe, expect, it } from "vitest";
import { sql as pg } from "@/db";
import type { CaseStatus } from "@/db/schema";
import { partsDemand } from "@/lib/reports/parts";
import { parseReportFilter } from "@/lib/reports/period";
import { resolveScope, type ReportScope } from "@/lib/reports/scope";
import { resetToDemo } from "../../support/seed";
import { day, demoIds, insertCases, type CaseSpec } from "./fixtures";
import { prng } from "@/lib/random";

const FAMILIES = ["orvanta-tessel-2", "pellacor-fennel-1"];
const PARTS = ["owc-uprated", "owc-standard", "gear-grease", "crank-seal-double", "needle-bearing-crank", "crank-sleeve"];
const STATUSES: CaseStatus[] = ["closed", "closed", "closed", "on_bench", "booked_in"];

/** Cases over 18 months with none, one or several parts each, some not closed. */
function generatedCases(n: number): CaseSpec[] {
  const next = prng(7);
  return Array.from({ length: n }, () => {
    const status = STATUSES[Math.floor(next() * STATUSES.length)];
    const closedAt = new Date(day("2024-07-01").getTime() + Math.floor(next() * 540) * 86_400_000);
    const parts = PARTS.filter(() => next() < 0.3).map((slug) => ({ slug, quantity: 1 + Math.floor(next() * 4) }));
    return { family: FAMILIES[Math.floor(next() * FAMILIES.length)], tree: "pedal-slip", status, closedAt, primary: "owc-cage-broken", parts };
  });
}

/** Quantities by month and part slug, summed from outcome_parts itself. */
async function reference(scope: ReportScope): Promise<Record<string, Record<string, number>>> {
  const { from, to } = scope.filter.period;
  const rows = await pg<{ month: string; slug: string; qty: number }[]>`
    select to_char(c.closed_at at time zone 'UTC', 'YYYY-MM') as month, p.slug, sum(op.quantity)::int as qty
    from cases c join outcome_parts op on op.case_id = c.id join parts p on p.id = op.part_id
    where c.status = 'closed' and c.closed_at >= ${from.toISOString()}::timestamptz and c.closed_at < ${to.toISOString()}::timestamptz
      and (${scope.familyId}::int is null or c.family_id = ${scope.familyId}::int)
    group by 1, 2`;
  const out: Record<string, Record<string, number>> = {};
  for (const r of rows) (out[r.month] ??= {})[r.slug] = r.qty;
  return out;
}

describe("parts demand against outcome_parts on generated cases", () => {
  beforeAll(async () => {
    await resetToDemo();
    await insertCases(await demoIds(), generatedCases(600));
  });

  it("sums the same quantities per month and part, for all families and for one", async () => {
    for (const filter of [{ from: "2024-09-01", to: "2025-10-31" }, { from: "2024-07-01", to: "2025-12-31", family: FAMILIES[1] }]) {
      const scope = await resolveScope(parseReportFilter(filter));
      const expected = await reference(scope);
      expect(Object.keys(expected).length).toBeGreaterThan(6);
      const { byMonth } = await partsDemand(scope);
      const nonEmpty = Object.fromEntries(Object.entries(byMonth).filter(([, parts]) => Object.keys(parts).length > 0));
      expect(nonEmpty).toEqual(expected);
    }
  });
});
