import "server-only";
import { sql as pg } from "@/db";
import { wilsonInterval } from "@/lib/diagnosis";
import { inScope, type ReportScope } from "./scope";

/** Bucket for closed cases whose primary confirmed cause is not a catalogue cause ("other"). */
export const OTHER_CAUSE = "_other";
export const OTHER_CAUSE_LABEL = "Other (not in the catalogue)";

export interface CauseCount {
  key: string;
  name: string;
  n: number;
}

export interface ParetoRow extends CauseCount {
  share: number;
  low: number;
  high: number;
  cumulative: number;
}

export interface Pareto {
  total: number;
  rows: ParetoRow[];
}

/** The GROUP BY behind the Pareto (exported for the benchmark's EXPLAIN). */
export function causeCountsQuery(scope: ReportScope) {
  return pg<{ key: string | null; name: string | null; n: number }[]>`
    select ca.slug as key, ca.name, count(*)::int as n
    from cases c
    left join outcome_causes oc on oc.case_id = c.id and oc.is_primary
    left join causes ca on ca.id = oc.cause_id
    where ${inScope(scope)}
    group by ca.slug, ca.name`;
}

/** Primary confirmed cause per closed case in scope, counted in Postgres. */
export async function causeCounts(scope: ReportScope): Promise<CauseCount[]> {
  const rows = await causeCountsQuery(scope);
  return rows.map((r) => ({ key: r.key ?? OTHER_CAUSE, name: r.name ?? OTHER_CAUSE_LABEL, n: r.n }));
}

/**
 * Pareto order (most frequent first, ties by name), each cause's share of the closed cases with
 * its Wilson 95 % interval, and the cumulative share down the list (statistics).
 */
export function paretoOf(counts: CauseCount[]): Pareto {
  const total = counts.reduce((s, c) => s + c.n, 0);
  const sorted = [...counts].sort((a, b) => b.n - a.n || a.name.localeCompare(b.name));
  let running = 0;
  const rows = sorted.map((c) => {
    running += c.n;
    const { low, high } = wilsonInterval(c.n, total);
    return { ...c, share: c.n / total, low, high, cumulative: running / total };
  });
  return { total, rows };
}

export async function causePareto(scope: ReportScope): Promise<Pareto> {
  return paretoOf(await causeCounts(scope));
}
