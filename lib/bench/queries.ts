import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import {
  assemblies, benchFindings, causeLocations, causeParts, causes, cases, motorFamilies, outcomeCauses, type CaseStatus,
} from "@/db/schema";
import type { BenchCause, BenchInputs, RecordedFinding, StageInfo } from "./types";

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

/** A family's stages, parents first. */
export async function familyStages(familyId: number): Promise<(StageInfo & { id: number })[]> {
  const rows = await db.select().from(assemblies).where(eq(assemblies.familyId, familyId)).orderBy(asc(assemblies.position), asc(assemblies.id));
  const slugOf = new Map(rows.map((r) => [r.id, r.slug]));
  return rows.map((r) => ({
    id: r.id, slug: r.slug, name: r.name, parent: r.parentId === null ? null : slugOf.get(r.parentId) ?? null,
    openMinutes: r.openMinutes, closeMinutes: r.closeMinutes, caution: r.caution,
  }));
}

/** Confirmed cause slugs of every closed case of the family. */
export async function closedCauseSets(familyId: number): Promise<string[][]> {
  const rows = await db.select({ caseId: outcomeCauses.caseId, slug: causes.slug })
    .from(outcomeCauses)
    .innerJoin(cases, eq(cases.id, outcomeCauses.caseId))
    .innerJoin(causes, eq(causes.id, outcomeCauses.causeId))
    .where(and(eq(cases.familyId, familyId), eq(cases.status, "closed")));
  const byCase = new Map<number, string[]>();
  for (const r of rows) byCase.set(r.caseId, [...(byCase.get(r.caseId) ?? []), r.slug]);
  return [...byCase.values()];
}

/**
 * Every catalogue cause located in the family's unit (or, where a family has no location for a
 * cause the ranking lists, in the unit as received at its stand-alone inspection minutes), with
 * its probability at the end of triage.
 */
export async function benchCauses(familyId: number, finalRanking: Record<string, number> | null, rootSlug: string): Promise<BenchCause[]> {
  const [rows, located, partRows] = await Promise.all([
    db.select({ id: causes.id, slug: causes.slug, name: causes.name, inspectMinutes: causes.inspectMinutes, labourMinutes: causes.labourMinutes, active: causes.active })
      .from(causes),
    db.select({ causeId: causeLocations.causeId, stage: assemblies.slug, inspectMinutes: causeLocations.inspectMinutes })
      .from(causeLocations).innerJoin(assemblies, eq(assemblies.id, causeLocations.assemblyId))
      .where(eq(causeLocations.familyId, familyId)),
    db.select({ causeId: causeParts.causeId, partId: causeParts.partId, quantity: causeParts.quantity }).from(causeParts),
  ]);
  const where = new Map(located.map((l) => [l.causeId, l]));
  const partsOf = new Map<number, { id: number; quantity: number }[]>();
  for (const p of partRows) partsOf.set(p.causeId, [...(partsOf.get(p.causeId) ?? []), { id: p.partId, quantity: p.quantity }]);
  return rows.flatMap((c) => {
    const prior = finalRanking?.[c.slug] ?? 0;
    const loc = where.get(c.id);
    if (!loc && prior === 0) return [];
    if (!c.active && prior === 0) return [];
    return [{
      id: c.id, slug: c.slug, name: c.name, stage: loc?.stage ?? rootSlug, inspectMinutes: loc?.inspectMinutes ?? c.inspectMinutes, catalogueMinutes: c.inspectMinutes,
      labourMinutes: c.labourMinutes, prior, parts: partsOf.get(c.id) ?? [],
    }];
  });
}

/** Findings of a case in the order they were recorded. */
export async function caseFindings(caseId: number): Promise<(RecordedFinding & { recordedAt: Date })[]> {
  return db.select({ cause: causes.slug, result: benchFindings.result, photoId: benchFindings.photoId, recordedAt: benchFindings.recordedAt })
    .from(benchFindings).innerJoin(causes, eq(causes.id, benchFindings.causeId))
    .where(eq(benchFindings.caseId, caseId)).orderBy(asc(benchFindings.recordedAt), asc(causes.slug));
}

const FALLBACK_ROOT: StageInfo = { slug: "unit", name: "Unit as received", parent: null, openMinutes: 0, closeMinutes: 0, caution: "none" };

/** Everything the bench screen works from; null when the case does not exist. */
export async function loadBench(caseId: number): Promise<BenchData | null> {
  const [row] = await db.select({
    id: cases.id, reference: cases.reference, status: cases.status, symptom: cases.symptom, familyId: cases.familyId,
    finalRanking: cases.finalRanking, familyName: motorFamilies.name, generation: motorFamilies.generation,
  }).from(cases).innerJoin(motorFamilies, eq(motorFamilies.id, cases.familyId)).where(eq(cases.id, caseId)).limit(1);
  if (!row) return null;
  const stored = await familyStages(row.familyId);
  // A family nobody has described yet still gets a plan: everything in the unit as received.
  const stages: StageInfo[] = stored.length ? stored : [FALLBACK_ROOT];
  const root = stages.find((s) => s.parent === null)!;
  const [benchCauseRows, findings, history] = await Promise.all([
    benchCauses(row.familyId, row.finalRanking, root.slug),
    caseFindings(caseId),
    closedCauseSets(row.familyId),
  ]);
  const known = new Set(stages.map((s) => s.slug));
  return {
    kase: {
      id: row.id, reference: row.reference, status: row.status, symptom: row.symptom, familyId: row.familyId,
      familyLabel: `${row.familyName} ${row.generation}`.trim(),
    },
    inputs: {
      stages,
      causes: benchCauseRows.map((c) => (known.has(c.stage) ? c : { ...c, stage: root.slug })),
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
