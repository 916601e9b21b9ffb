import "server-only";
import { sql as pg } from "@/db";
import { wilsonInterval } from "@/lib/diagnosis";
import { inScope, type ReportScope } from "./scope";

export interface RepeatPair {
  caseId: number;
  reference: string;
  earlierId: number;
  earlierReference: string;
  days: number;
  /** As Postgres prints it (the shared client leaves timestamps as text). */
  closedAt: string;
}

export interface RepeatRate {
  closed: number;
  repeats: number;
  rate: number;
  low: number;
  high: number;
  recent: RepeatPair[];
}

/**
 * Share of the closed cases in scope that are repeat returns: the unit came back with the same
 * serial within 90 days of an earlier case of the same family (cases.repeat_of_case_id).
 */
export async function repeatRate(scope: ReportScope, recentLimit = 8): Promise<RepeatRate> {
  const [[counts], recent] = await Promise.all([
    pg<{ closed: number; repeats: number }[]>`
      select count(*)::int as closed, count(c.repeat_of_case_id)::int as repeats from cases c where ${inScope(scope)}`,
    pg<RepeatPair[]>`
      select c.id as "caseId", c.reference, e.id as "earlierId", e.reference as "earlierReference",
             floor(extract(epoch from c.created_at - e.created_at) / 86400)::int as days, c.closed_at as "closedAt"
      from cases c join cases e on e.id = c.repeat_of_case_id
      where ${inScope(scope)}
      order by c.closed_at desc
      limit ${recentLimit}`,
  ]);
  const interval = counts.closed > 0 ? wilsonInterval(counts.repeats, counts.closed) : { low: 0, high: 0 };
  return { ...counts, rate: counts.closed > 0 ? counts.repeats / counts.closed : 0, ...interval, recent };
}
