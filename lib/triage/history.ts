import "server-only";
import { sql } from "@/db";

/**
 * Confirmed bench outcomes for a motor family, by cause slug: the counts n_k that move the
 * priors, one GROUP BY over the outcome causes of its closed cases.
 */
export async function familyHistory(familyId: number): Promise<Record<string, number>> {
  const rows = await sql<{ slug: string; n: number }[]>`
    select k.slug, count(*)::int as n
    from outcome_causes oc
    join cases hc on hc.id = oc.case_id
    join causes k on k.id = oc.cause_id
    where hc.family_id = ${familyId} and hc.status = 'closed'
    group by k.slug`;
  return Object.fromEntries(rows.map((r) => [r.slug, r.n]));
}
