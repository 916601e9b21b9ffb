import "server-only";
import { sql as pg } from "@/db";
import { monthsOf } from "./period";
import { inScope, type ReportScope } from "./scope";

export const TREND_TOP = 5;
/** Series key for every cause outside the top five (and causes not in the catalogue). */
export const TREND_REST = "_rest";

export interface TrendSeries {
  key: string;
  name: string;
}

export interface CauseTrend {
  series: TrendSeries[];
  /** One row per month of the period: month "YYYY-MM", then a count per series key. */
  months: ({ month: string } & Record<string, number | string>)[];
}

export function causeTrendQuery(scope: ReportScope) {
  // Counted per (month, cause) first; the top five and the labels are worked out on those few rows.
  return pg<{ month: string; key: string | null; name: string | null; n: number }[]>`
    with counts as (
      select date_trunc('month', c.closed_at at time zone 'UTC') as m, oc.cause_id, count(*)::int as n
      from cases c
      left join outcome_causes oc on oc.case_id = c.id and oc.is_primary
      where ${inScope(scope)}
      group by 1, 2
    ), top as (
      select k.cause_id, ca.slug, ca.name
      from counts k join causes ca on ca.id = k.cause_id
      group by k.cause_id, ca.slug, ca.name
      order by sum(k.n) desc, ca.name
      limit ${TREND_TOP}
    )
    select to_char(k.m, 'YYYY-MM') as month, t.slug as key, t.name, sum(k.n)::int as n
    from counts k left join top t on t.cause_id = k.cause_id
    group by k.m, t.slug, t.name`;
}

/** Closed cases per month by primary cause: the period's five most frequent causes, the rest together. */
export async function causeTrend(scope: ReportScope): Promise<CauseTrend> {
  const rows = await causeTrendQuery(scope);
  const totals = new Map<string, { name: string; n: number }>();
  for (const r of rows) {
    if (!r.key) continue;
    const t = totals.get(r.key) ?? { name: r.name ?? r.key, n: 0 };
    t.n += r.n;
    totals.set(r.key, t);
  }
  const series: TrendSeries[] = [...totals]
    .sort((a, b) => b[1].n - a[1].n || a[1].name.localeCompare(b[1].name))
    .map(([key, t]) => ({ key, name: t.name }));
  if (rows.some((r) => !r.key)) series.push({ key: TREND_REST, name: "All other causes" });

  const byMonth = new Map(monthsOf(scope.filter.period).map((m) => [m, { month: m } as { month: string } & Record<string, number | string>]));
  for (const m of byMonth.values()) for (const s of series) m[s.key] = 0;
  for (const r of rows) {
    const m = byMonth.get(r.month);
    if (m) m[r.key ?? TREND_REST] = r.n;
  }
  return { series, months: [...byMonth.values()] };
}
