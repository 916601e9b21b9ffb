import "server-only";
import { and, eq, inArray, isNotNull, sql } from "drizzle-orm";
import { db, type Tx } from "@/db";
import { DiagnosisError } from "@/lib/diagnosis";
import { caseOutcomes, cases } from "@/db/schema";
import { teardownMinutesIn } from "./compare";
import { causeCatalogue, causeLocationsByFamily, stagesByFamily } from "./queries";
import { familyBench } from "./start";

const CHUNK = 1000;

/**
 * (Re)writes the planned teardown minutes of these cases' bench outcomes: the expected minutes of
 * the teardown plan their final ranking gives in their family's stages and cause locations as they
 * stand now (what the bench screen planned from). Every writer of a bench outcome calls it in the
 * outcome's transaction, so the figure is the plan of its day: a later edit of the stages leaves it
 * as it was, and a reopened case that is saved again is planned again. A case without a final
 * ranking (an imported record) keeps none, and so does one whose ranking the planner refuses (its
 * probabilities sum to more than 1): the outcome is saved all the same.
 */
export async function storePlannedTeardown(tx: Tx, caseIds: number[]): Promise<void> {
  if (caseIds.length === 0) return;
  const rows: { id: number; familyId: number; ranking: Record<string, number> | null }[] = [];
  for (let i = 0; i < caseIds.length; i += CHUNK) {
    rows.push(...await tx.select({ id: cases.id, familyId: cases.familyId, ranking: cases.finalRanking })
      .from(cases).innerJoin(caseOutcomes, eq(caseOutcomes.caseId, cases.id))
      .where(and(inArray(cases.id, caseIds.slice(i, i + CHUNK)), isNotNull(cases.finalRanking))));
  }
  if (rows.length === 0) return;
  // Only the stages and locations of the families these cases are of.
  const families = [...new Set(rows.map((r) => r.familyId))];
  const [stages, catalogue, located] = await Promise.all([stagesByFamily(tx, families), causeCatalogue(tx), causeLocationsByFamily(tx, families)]);
  const planners = new Map<number, (ranking: Record<string, number>) => number | null>();
  const plannerOf = (familyId: number) => {
    let planner = planners.get(familyId);
    if (!planner) {
      const bench = familyBench(stages.get(familyId) ?? [], catalogue, located.get(familyId) ?? []);
      const minutesOf = teardownMinutesIn(bench.stages);
      planner = (ranking) => {
        try {
          return minutesOf(bench.causesAfter(ranking));
        } catch (error) {
          if (error instanceof DiagnosisError) return null;
          throw error;
        }
      };
      planners.set(familyId, planner);
    }
    return planner;
  };
  for (let i = 0; i < rows.length; i += CHUNK) {
    const chunk = rows.slice(i, i + CHUNK);
    const minutes = chunk.map((r) => plannerOf(r.familyId)(r.ranking!) ?? "NULL");
    await tx.execute(sql`
      update case_outcomes o set planned_teardown_minutes = v.minutes
      from unnest(${`{${chunk.map((r) => r.id).join(",")}}`}::int[], ${`{${minutes.join(",")}}`}::float8[]) as v(case_id, minutes)
      where o.case_id = v.case_id`);
  }
}

/**
 * Plans the outcomes a database from before the figure was stored lacks (every outcome of a case
 * with a final ranking has one once written); returns how many.
 */
export async function plannedTeardownMissing(): Promise<number> {
  const missing = await db.select({ id: caseOutcomes.caseId })
    .from(caseOutcomes).innerJoin(cases, eq(cases.id, caseOutcomes.caseId))
    .where(and(isNotNull(cases.finalRanking), sql`${caseOutcomes.plannedTeardownMinutes} is null`));
  if (missing.length) await db.transaction((tx) => storePlannedTeardown(tx, missing.map((m) => m.id)));
  return missing.length;
}
