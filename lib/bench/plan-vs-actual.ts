import "server-only";
import { sql as pg } from "@/db";
import { inScope, type ReportScope } from "@/lib/reports/scope";

export interface PlanVsActualRow {
  familyId: number;
  family: string;
  cases: number;
  /** Median expected teardown minutes of the plan at the start of the bench. */
  planned: number;
  /** Median labour minutes recorded in the outcome (teardown and repair). */
  recorded: number;
}

/**
 * Per motor family, closed cases in scope with a triage ranking and recorded labour: the expected
 * teardown minutes of the plan the bench started from (stored with the outcome) against the labour
 * the technician recorded. Medians are the mean of the two middle values for an even count.
 */
export async function planVsActual(scope: ReportScope): Promise<PlanVsActualRow[]> {
  return pg<PlanVsActualRow[]>`
    select c.family_id as "familyId", f.name || case when f.generation <> '' then ' ' || f.generation else '' end as family,
           count(*)::int as cases,
           percentile_cont(0.5) within group (order by o.planned_teardown_minutes) as planned,
           percentile_cont(0.5) within group (order by o.labour_minutes) as recorded
    from cases c
    join case_outcomes o on o.case_id = c.id
    join motor_families f on f.id = c.family_id
    where ${inScope(scope)} and o.planned_teardown_minutes is not null and o.labour_minutes > 0
    group by c.family_id, f.name, f.generation
    order by family`;
}
