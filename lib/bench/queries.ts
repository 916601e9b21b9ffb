import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import { db, type Db, type Tx } from "@/db";
import { groupBy } from "@/lib/group-by";
import {
  assemblies, benchFindings, causeLocations, causeParts, causes, cases, motorFamilies, outcomeCauses, type CaseStatus,
} from "@/db/schema";
import { familyBench, type CauseCatalogue, type CauseLocation, type FamilyBench } from "./start";
import type { BenchInputs, RecordedFinding, StageInfo } from "./types";

export interface BenchCase {
  id: number;
  reference: string;
  status: CaseStatus;
  symptom: string;
  familyId: number;
  familyLabel: string;
}

export interface BenchData {
  kase: BenchCase;
  inputs: BenchInputs;
  /** Photo of each finding that has one, by cause slug. */
  photos: Record<string, string>;
}

type FamilyStage = StageInfo & { id: number };

/** The stages of the families given (all of them when none are), parents first, by family id. */
export async function stagesByFamily(conn: Db | Tx = db, familyIds?: number[]): Promise<Map<number, FamilyStage[]>> {
  const rows = await conn.select().from(assemblies).where(familyIds && inArray(assemblies.familyId, familyIds)).orderBy(asc(assemblies.familyId), asc(assemblies.position), asc(assemblies.id));
  const slugOf = new Map(rows.map((r) => [r.id, r.slug]));
  const byFamily = new Map<number, FamilyStage[]>();
  for (const [familyId, familyRows] of groupBy(rows, (r) => r.familyId)) {
    byFamily.set(familyId, familyRows.map((r) => ({
      id: r.id, slug: r.slug, name: r.name, parent: r.parentId === null ? null : slugOf.get(r.parentId) ?? null,
      openMinutes: r.openMinutes, closeMinutes: r.closeMinutes, caution: r.caution,
    })));
  }
  return byFamily;
}

/** A family's stages, parents first. */
export async function familyStages(familyId: number): Promise<FamilyStage[]> {
  return (await stagesByFamily(db, [familyId])).get(familyId) ?? [];
}

/** Confirmed cause slugs of every closed case of the family. */
export async function closedCauseSets(familyId: number): Promise<string[][]> {
  const rows = await db.select({ caseId: outcomeCauses.caseId, slug: causes.slug })
    .from(outcomeCauses)
    .innerJoin(cases, eq(cases.id, outcomeCauses.caseId))
    .innerJoin(causes, eq(causes.id, outcomeCauses.causeId))
    .where(and(eq(cases.familyId, familyId), eq(cases.status, "closed")));
  return [...groupBy(rows, (r) => r.caseId).values()].map((caseRows) => caseRows.map((r) => r.slug));
}

/** Every catalogue cause with the parts its repair takes. */
export async function causeCatalogue(conn: Db | Tx = db): Promise<CauseCatalogue> {
  const [rows, partRows] = await Promise.all([
    conn.select({ id: causes.id, slug: causes.slug, name: causes.name, inspectMinutes: causes.inspectMinutes, labourMinutes: causes.labourMinutes, active: causes.active })
      .from(causes),
    conn.select({ causeId: causeParts.causeId, partId: causeParts.partId, quantity: causeParts.quantity }).from(causeParts),
  ]);
  const partsOf = new Map<number, { id: number; quantity: number }[]>();
  for (const [causeId, parts] of groupBy(partRows, (p) => p.causeId)) partsOf.set(causeId, parts.map((p) => ({ id: p.partId, quantity: p.quantity })));
  return { causes: rows, partsOf };
}

/** Where each cause is inspected in the families given (all of them when none are), by family id. */
export async function causeLocationsByFamily(conn: Db | Tx = db, familyIds?: number[]): Promise<Map<number, CauseLocation[]>> {
  const rows = await conn.select({ familyId: causeLocations.familyId, causeId: causeLocations.causeId, stage: assemblies.slug, inspectMinutes: causeLocations.inspectMinutes })
    .from(causeLocations).innerJoin(assemblies, eq(assemblies.id, causeLocations.assemblyId))
    .where(familyIds && inArray(causeLocations.familyId, familyIds));
  const byFamily = new Map<number, CauseLocation[]>();
  for (const [family, familyRows] of groupBy(rows, (r) => r.familyId)) {
    byFamily.set(family, familyRows.map((r) => ({ causeId: r.causeId, stage: r.stage, inspectMinutes: r.inspectMinutes })));
  }
  return byFamily;
}

/** A family's described stages (none yet, perhaps) and its {@link FamilyBench}, read from the database. */
export async function loadFamilyBench(familyId: number): Promise<{ described: FamilyStage[]; bench: FamilyBench }> {
  const [described, catalogue, located] = await Promise.all([familyStages(familyId), causeCatalogue(), causeLocationsByFamily(db, [familyId])]);
  return { described, bench: familyBench(described, catalogue, located.get(familyId) ?? []) };
}

/** Findings of a case in the order they were recorded. */
export async function caseFindings(caseId: number): Promise<(RecordedFinding & { recordedAt: Date })[]> {
  return db.select({ cause: causes.slug, result: benchFindings.result, photoId: benchFindings.photoId, recordedAt: benchFindings.recordedAt })
    .from(benchFindings).innerJoin(causes, eq(causes.id, benchFindings.causeId))
    .where(eq(benchFindings.caseId, caseId)).orderBy(asc(benchFindings.recordedAt), asc(causes.slug));
}

/** Everything the bench screen works from; null when the case does not exist. */
export async function loadBench(caseId: number): Promise<BenchData | null> {
  const [row] = await db.select({
    id: cases.id, reference: cases.reference, status: cases.status, symptom: cases.symptom, familyId: cases.familyId,
    finalRanking: cases.finalRanking, familyName: motorFamilies.name, generation: motorFamilies.generation,
  }).from(cases).innerJoin(motorFamilies, eq(motorFamilies.id, cases.familyId)).where(eq(cases.id, caseId)).limit(1);
  if (!row) return null;
  const [{ bench }, findings, history] = await Promise.all([loadFamilyBench(row.familyId), caseFindings(caseId), closedCauseSets(row.familyId)]);
  return {
    kase: {
      id: row.id, reference: row.reference, status: row.status, symptom: row.symptom, familyId: row.familyId,
      familyLabel: `${row.familyName} ${row.generation}`.trim(),
    },
    inputs: {
      stages: bench.stages,
      causes: bench.causesAfter(row.finalRanking),
      unlisted: row.finalRanking?.unlisted ?? 0,
      findings: findings.map(({ cause, result, photoId }) => ({ cause, result, photoId })),
      history,
    },
    photos: Object.fromEntries(findings.flatMap((f) => (f.photoId ? [[f.cause, f.photoId]] : []))),
  };
}

export function causeIdsBySlug(slugs: string[]) {
  return slugs.length ? db.select({ id: causes.id, slug: causes.slug }).from(causes).where(inArray(causes.slug, slugs)) : Promise.resolve([]);
}
