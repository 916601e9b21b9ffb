import "server-only";
import { sql as pg } from "@/db";
import { groupBy } from "@/lib/group-by";
import { inScope, type ReportScope } from "@/lib/reports/scope";
import { median, teardownMinutesIn } from "./compare";
import { causeCatalogue, causeLocationsByFamily, stagesByFamily } from "./queries";
import { familyBench } from "./start";

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
 * teardown minutes of the plan the bench screen started from (its stages and the case's final
 * ranking) against the labour the technician recorded.
 */
export async function planVsActual(scope: ReportScope): Promise<PlanVsActualRow[]> {
  type Row = { familyId: number; family: string; ranking: Record<string, number>; labour: number };
  const [rows, stages, catalogue, located] = await Promise.all([
    pg<Row[]>`
      select c.family_id as "familyId", f.name || case when f.generation <> '' then ' ' || f.generation else '' end as family,
             c.final_ranking as ranking, o.labour_minutes as labour
      from cases c
      join case_outcomes o on o.case_id = c.id
      join motor_families f on f.id = c.family_id
      where ${inScope(scope)} and c.final_ranking is not null and o.labour_minutes > 0`,
    stagesByFamily(),
    causeCatalogue(),
    causeLocationsByFamily(),
  ]);
  return [...groupBy(rows, (r) => r.familyId)]
    .map(([familyId, familyCases]) => {
      const bench = familyBench(stages.get(familyId) ?? [], catalogue, located.get(familyId) ?? []);
      const minutesOf = teardownMinutesIn(bench.stages);
      const planned = familyCases.map((c) => minutesOf(bench.causesAfter(c.ranking)));
      return { familyId, family: familyCases[0].family, cases: familyCases.length, planned: median(planned), recorded: median(familyCases.map((c) => c.labour)) };
    })
    .sort((a, b) => a.family.localeCompare(b.family));
}
