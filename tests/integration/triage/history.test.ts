import { beforeAll, describe, expect, it } from "vitest";
import { sql as pg } from "@/db";
import { seed } from "@/db/seed";
import { familyHistory } from "@/lib/triage/history";
import { truncateAll } from "../../support/db";

/** The counts straight from the bench outcomes, as the history is defined. */
async function fromOutcomes(familyId: number, closedBefore?: Date): Promise<Record<string, number>> {
  const before = closedBefore?.toISOString() ?? null;
  const rows = await pg<{ slug: string; n: number }[]>`
    select k.slug, count(*)::int as n
    from outcome_causes oc join cases hc on hc.id = oc.case_id join causes k on k.id = oc.cause_id
    where hc.family_id = ${familyId} and hc.status = 'closed' and (${before}::timestamptz is null or hc.closed_at < ${before}::timestamptz)
    group by k.slug`;
  return Object.fromEntries(rows.map((r) => [r.slug, r.n]));
}

describe("a motor family's confirmed history", () => {
  let families: { id: number; closed: number; middle: Date }[];

  beforeAll(async () => {
    // The simulated history: thousands of closed cases, some confirming two causes.
    await truncateAll();
    await seed({ force: true });
    const rows = await pg<{ id: number; closed: number; middle_ms: number }[]>`
      select family_id as id, count(*)::int as closed, (percentile_cont(0.5) within group (order by extract(epoch from closed_at)) * 1000)::float8 as middle_ms
      from cases where status = 'closed' group by family_id order by family_id`;
    families = rows.map((r) => ({ id: r.id, closed: r.closed, middle: new Date(r.middle_ms) }));
  });

  it("counts every confirmed cause of the family's closed cases, as outcome_causes holds them", async () => {
    expect(families.length).toBeGreaterThan(1);
    for (const family of families) {
      const history = await familyHistory(family.id);
      expect(Object.values(history).reduce((a, n) => a + n, 0)).toBeGreaterThanOrEqual(family.closed);
      expect(history).toEqual(await fromOutcomes(family.id));
    }
  });

  it("counts only the cases closed before a given moment when asked", async () => {
    for (const family of families) {
      const earlier = await familyHistory(family.id, family.middle);
      expect(earlier).toEqual(await fromOutcomes(family.id, family.middle));
      expect(Object.values(earlier).reduce((a, n) => a + n, 0)).toBeLessThan(Object.values(await familyHistory(family.id)).reduce((a, n) => a + n, 0));
    }
  });

  it("leaves out a case that is reopened", async () => {
    const [kase] = await pg<{ id: number; family_id: number }[]>`select id, family_id from cases where status = 'closed' and cardinality(confirmed_cause_ids) > 0 limit 1`;
    const before = await familyHistory(kase.family_id);
    await pg`update cases set status = 'on_bench', closed_at = null where id = ${kase.id}`;
    const after = await familyHistory(kase.family_id);
    expect(Object.values(after).reduce((a, n) => a + n, 0)).toBeLessThan(Object.values(before).reduce((a, n) => a + n, 0));
    expect(after).toEqual(await fromOutcomes(kase.family_id));
  });
});
