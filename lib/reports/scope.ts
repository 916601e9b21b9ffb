import "server-only";
import { sql as pg } from "@/db";
import type { ReportFilter } from "./period";

/**
 * The cases a report counts: closed ones, closed inside the period, of the chosen motor family.
 * Open, advised, booked-in and on-bench cases never count, whatever outcome they hold so far.
 */
export interface ReportScope {
  filter: ReportFilter;
  familyId: number | null;
  familyName: string | null;
}

export async function resolveScope(filter: ReportFilter): Promise<ReportScope> {
  if (!filter.familySlug) return { filter, familyId: null, familyName: null };
  const [row] = await pg<{ id: number; name: string }[]>`
    select id, name || case when generation <> '' then ' ' || generation else '' end as name from motor_families where slug = ${filter.familySlug}`;
  // An unknown family in a hand-edited URL reports on all families rather than on nothing.
  if (!row) return { filter: { ...filter, familySlug: null }, familyId: null, familyName: null };
  return { filter, familyId: row.id, familyName: row.name };
}

/** The WHERE condition for `cases c` in scope, as a postgres.js fragment. */
export function inScope(scope: ReportScope) {
  const { from, to } = scope.filter.period;
  const family = scope.familyId === null ? pg`` : pg`and c.family_id = ${scope.familyId}`;
  return pg`c.status = 'closed' and c.closed_at >= ${from.toISOString()}::timestamptz and c.closed_at < ${to.toISOString()}::timestamptz ${family}`;
}

export async function familyOptions(): Promise<{ slug: string; name: string }[]> {
  return pg<{ slug: string; name: string }[]>`
    select f.slug, f.name || case when f.generation <> '' then ' ' || f.generation else '' end as name
    from motor_families f
    order by f.name, f.generation`;
}
