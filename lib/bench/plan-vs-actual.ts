import "server-only";
import { sql as pg } from "@/db";
import { inScope, type ReportScope } from "@/lib/reports/scope";
import { median, teardownMinutes } from "./compare";
import { benchCauses, familyStages } from "./queries";

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
 * teardown minutes of their plan against the labour the technician recorded.
 */
export async function planVsActual(scope: ReportScope): Promise<PlanVsActualRow[]> {
  type Row = { familyId: number; family: string; ranking: Record<string, number>; labour: number };
  const rows: Row[] = await pg<Row[]>`
    select c.family_id as "familyId", f.name || case when f.generation <> '' then ' ' || f.generation else '' end as family,
           c.final_ranking as ranking, o.labour_minutes as labour
    from cases c
    join case_outcomes o on o.case_id = c.id
    join motor_families f on f.id = c.family_id
    where ${inScope(scope)} and c.final_ranking is not null and o.labour_minutes > 0`;
  const byFamily = new Map<number, Row[]>();
  for (const r of rows) byFamily.set(r.familyId, [...(byFamily.get(r.familyId) ?? []), r]);
  const out = await Promise.all([...byFamily].map(async ([familyId, cases]): Promise<PlanVsActualRow | null> => {
    const stages = await familyStages(familyId);
    const root = stages.find((s) => s.parent === null);
    if (!root) return null;
    const located = await benchCauses(familyId, null, root.slug);
    const planned = cases.map((c) => teardownMinutes(stages, located.map((l) => ({ ...l, prior: c.ranking[l.slug] ?? 0 }))));
    return { familyId, family: cases[0].family, cases: cases.length, planned: median(planned), recorded: median(cases.map((c) => c.labour)) };
  }));
  return out.filter((r) => r !== null).sort((a, b) => a.family.localeCompare(b.family));
}
