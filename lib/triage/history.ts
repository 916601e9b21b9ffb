import "server-only";
import { sql } from "@/db";

/**
 * Confirmed bench outcomes for a motor family, by cause slug: the counts n_k that move the
 * priors, over its closed cases (those closed before `closedBefore` when given). Read on every
 * answer, so it reads the copy of each case's confirmed causes on its row (`confirmed_cause_ids`,
 * kept equal to outcome_causes by `storeOutcomeCopies`) from cases_family_history_idx alone.
 */
export async function familyHistory(familyId: number, closedBefore?: Date): Promise<Record<string, number>> {
  const before = closedBefore?.toISOString() ?? null;
  const rows = await sql<{ slug: string; n: number }[]>`
    select k.slug, count(*)::int as n
    from cases hc
    cross join lateral unnest(hc.confirmed_cause_ids) as confirmed(cause_id)
    join causes k on k.id = confirmed.cause_id
    where hc.family_id = ${familyId} and hc.status = 'closed'
      and (${before}::timestamptz is null or hc.closed_at < ${before}::timestamptz)
    group by k.slug`;
  return Object.fromEntries(rows.map((r) => [r.slug, r.n]));
}
