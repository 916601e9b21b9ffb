import "server-only";
import { sql } from "@/db";

/** How long a family's confirmed history is reused before it is counted again. */
export const HISTORY_TTL_MS = 30_000;

const globalCache = globalThis as unknown as { rootbenchFamilyHistory?: Map<number, { at: number; counts: Promise<Record<string, number>> }> };
const cache = (globalCache.rootbenchFamilyHistory ??= new Map());

/**
 * Confirmed bench outcomes for a motor family, by cause slug: the priors' n_k (DESIGN §4), one
 * GROUP BY over the outcome causes of its closed cases. Kept for 30 s per process: with a few
 * thousand closed cases the count costs about as much as the rest of an answer, and a prior that
 * lags a just-closed case by seconds changes nothing a caller would notice.
 */
export function familyHistory(familyId: number, now = Date.now()): Promise<Record<string, number>> {
  const hit = cache.get(familyId);
  if (hit && now - hit.at < HISTORY_TTL_MS) return hit.counts;
  const counts = sql<{ slug: string; n: number }[]>`
    select k.slug, count(*)::int as n
    from outcome_causes oc
    join cases hc on hc.id = oc.case_id
    join causes k on k.id = oc.cause_id
    where hc.family_id = ${familyId} and hc.status = 'closed'
    group by k.slug`.then((rows) => Object.fromEntries(rows.map((r) => [r.slug, r.n])));
  cache.set(familyId, { at: now, counts });
  counts.catch(() => cache.delete(familyId));
  return counts;
}

/** Tests and imports that change history call this to count again at once. */
export function forgetFamilyHistory(): void {
  cache.clear();
}
