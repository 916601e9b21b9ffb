import { beforeAll, describe, expect, it } from "vitest";
import { sql as pg } from "@/db";
import { seed } from "@/db/seed";
import { loadCaseContext } from "@/lib/triage/context";
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

const total = (history: Record<string, number> | undefined) => Object.values(history ?? {}).reduce((a, n) => a + n, 0);
const historyOf = async (caseId: number, historyAsOfStart = false) => (await loadCaseContext(caseId, { historyAsOfStart }))!.settings.history;

describe("a case's motor family history, read with the case", () => {
  /** Per family: how many closed cases, and the case started nearest the middle of its closings. */
  let families: { id: number; closed: number; caseId: number; startedAt: Date }[];

  beforeAll(async () => {
    // The simulated history: thousands of closed cases, some confirming two causes.
    await truncateAll();
    await seed({ force: true });
    families = (await pg<{ id: number; closed: number; case_id: number; started_ms: number }[]>`
      with middle as (
        select family_id, count(*)::int as closed, percentile_cont(0.5) within group (order by extract(epoch from closed_at)) as mid
        from cases where status = 'closed' group by family_id)
      select m.family_id as id, m.closed, c.id as case_id, (extract(epoch from c.created_at) * 1000)::float8 as started_ms
      from middle m cross join lateral (
        select id, created_at from cases where family_id = m.family_id order by abs(extract(epoch from created_at) - m.mid) limit 1) c
      order by m.family_id`).map((r) => ({ id: r.id, closed: r.closed, caseId: r.case_id, startedAt: new Date(r.started_ms) }));
  });

  it("counts every confirmed cause of the family's closed cases, as outcome_causes holds them", async () => {
    expect(families.length).toBeGreaterThan(1);
    for (const family of families) {
      const history = await historyOf(family.caseId);
      expect(total(history)).toBeGreaterThanOrEqual(family.closed);
      expect(history).toEqual(await fromOutcomes(family.id));
    }
  });

  it("counts only the cases closed before the case was started when asked (a practice replay)", async () => {
    for (const family of families) {
      const earlier = await historyOf(family.caseId, true);
      expect(earlier).toEqual(await fromOutcomes(family.id, family.startedAt));
      expect(total(earlier)).toBeLessThan(total(await historyOf(family.caseId)));
    }
  });

  it("leaves out a case that is reopened", async () => {
    const [kase] = await pg<{ id: number; family_id: number }[]>`select id, family_id from cases where status = 'closed' and cardinality(confirmed_cause_ids) > 0 limit 1`;
    const reader = families.find((f) => f.id === kase.family_id)!.caseId;
    const before = await historyOf(reader);
    await pg`update cases set status = 'on_bench', closed_at = null where id = ${kase.id}`;
    const after = await historyOf(reader);
    expect(total(after)).toBeLessThan(total(before));
    expect(after).toEqual(await fromOutcomes(kase.family_id));
  });
});
