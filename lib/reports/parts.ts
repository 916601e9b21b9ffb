import "server-only";
import { sql as pg } from "@/db";
import { monthsOf } from "./period";
import { inScope, type ReportScope } from "./scope";

export interface PartTotal {
  slug: string;
  name: string;
  sku: string;
  total: number;
  perMonth: number;
}

export interface PartsDemand {
  months: string[];
  parts: PartTotal[];
  /** quantity by month, then by part slug */
  byMonth: Record<string, Record<string, number>>;
}

export function partsDemandQuery(scope: ReportScope) {
  // The case rows carry a copy of their parts replaced (part_ids, part_quantities, in one order), so only
  // the cases in scope are read, with no join to outcome_parts. Grouped on the truncated timestamp and
  // the part id first; names and month labels join the few result rows.
  return pg<{ month: string; slug: string; name: string; sku: string; qty: number }[]>`
    with used as (
      select date_trunc('month', c.closed_at at time zone 'UTC') as m, unnest(c.part_ids) as part_id, unnest(c.part_quantities) as quantity
      from cases c
      where ${inScope(scope)}
    ),
    per_month as (
      select m, part_id, sum(quantity)::int as qty from used group by 1, 2
    )
    select to_char(pm.m, 'YYYY-MM') as month, p.slug, p.name, p.sku, pm.qty
    from per_month pm join parts p on p.id = pm.part_id`;
}

/** Parts replaced per month on closed cases in scope (quantities summed in Postgres), to plan stock. */
export async function partsDemand(scope: ReportScope): Promise<PartsDemand> {
  const rows = await partsDemandQuery(scope);
  const months = monthsOf(scope.filter.period);
  const byMonth: Record<string, Record<string, number>> = Object.fromEntries(months.map((m) => [m, {}]));
  const totals = new Map<string, PartTotal>();
  for (const r of rows) {
    (byMonth[r.month] ??= {})[r.slug] = r.qty;
    const t = totals.get(r.slug) ?? { slug: r.slug, name: r.name, sku: r.sku, total: 0, perMonth: 0 };
    t.total += r.qty;
    totals.set(r.slug, t);
  }
  const parts = [...totals.values()]
    .map((t) => ({ ...t, perMonth: t.total / Math.max(1, months.length) }))
    .sort((a, b) => b.total - a.total || a.name.localeCompare(b.name));
  return { months, parts, byMonth };
}
