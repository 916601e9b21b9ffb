import "server-only";
import { sql } from "@/db";

/**
 * Confirmed bench outcomes for a motor family, by cause slug: the counts n_k that move the
 * priors, one GROUP BY over the outcome causes of its closed cases (those closed before
 * `closedBefore` when given).
 */
export async function familyHistory(familyId: number, closedBefore?: Date): Promise<Record<string, number>> {
  const before = closedBefore?.toISOString() ?? null;
  const rows = await sql<{ slug: string; n: number }[]>`
    select k.slug, count(*)::int as n
    from outcome_causes oc
    join cases hc on hc.id = oc.case_id
    join causes k on k.id = oc.cause_id
    where hc.family_id = ${familyId} and hc.status = 'closed'
      and (${before}::timestamptz is null or hc.closed_at < ${before}::timestamptz)
    group by k.slug`;
  return Object.fromEntries(rows.map((r) => [r.slug, r.n]));
}
