import "server-only";
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { caseEvents, cases, caseSteps, motorFamilies, motorMakers, trees, treeScope, treeVersions, users } from "@/db/schema";

export interface FamilyChoice {
  id: number;
  label: string;
}

export async function familyChoices(): Promise<FamilyChoice[]> {
  const rows = await db.select({ id: motorFamilies.id, name: motorFamilies.name, generation: motorFamilies.generation, maker: motorMakers.name })
    .from(motorFamilies).innerJoin(motorMakers, eq(motorMakers.id, motorFamilies.makerId))
    .orderBy(asc(motorMakers.name), asc(motorFamilies.name), asc(motorFamilies.generation));
  return rows.map((r) => ({ id: r.id, label: `${r.name} ${r.generation}`.trim() }));
}

export interface TreeChoice {
  versionId: number;
  treeId: number;
  symptom: string;
  title: string;
  description: string;
  /** Empty: the tree applies to every motor family. */
  familyIds: number[];
}

/** The newest published version of every tree in use, with the families it is scoped to. */
export async function treeChoices(): Promise<TreeChoice[]> {
  const rows = await db.selectDistinctOn([treeVersions.treeId], {
    versionId: treeVersions.id, treeId: trees.id, symptom: trees.symptom, title: trees.title, description: trees.description,
  })
    .from(treeVersions)
    .innerJoin(trees, eq(trees.id, treeVersions.treeId))
    .where(and(eq(treeVersions.state, "published"), eq(trees.archived, false)))
    .orderBy(treeVersions.treeId, desc(treeVersions.number));
  rows.sort((a, b) => a.symptom.localeCompare(b.symptom));
  const scope = rows.length ? await db.select().from(treeScope).where(inArray(treeScope.treeId, rows.map((r) => r.treeId))) : [];
  return rows.map((r) => ({ ...r, familyIds: scope.filter((s) => s.treeId === r.treeId).map((s) => s.familyId) }));
}

/** The case row with its family and tree labels, for the walk and the case page. */
export async function caseHeader(caseId: number) {
  const [row] = await db.select({
    case: cases, familyName: motorFamilies.name, familyGeneration: motorFamilies.generation, treeTitle: trees.title,
    treeVersionNumber: treeVersions.number, technicianName: users.name,
  })
    .from(cases)
    .innerJoin(motorFamilies, eq(motorFamilies.id, cases.familyId))
    .innerJoin(treeVersions, eq(treeVersions.id, cases.treeVersionId))
    .innerJoin(trees, eq(trees.id, treeVersions.treeId))
    .leftJoin(users, eq(users.id, cases.technicianId))
    .where(eq(cases.id, caseId)).limit(1);
  if (!row) return null;
  return { ...row.case, familyLabel: `${row.familyName} ${row.familyGeneration}`.trim(), treeTitle: row.treeTitle, treeVersionNumber: row.treeVersionNumber, technicianName: row.technicianName };
}
export type CaseHeader = NonNullable<Awaited<ReturnType<typeof caseHeader>>>;

export async function caseStepRows(caseId: number) {
  return db.select({ id: caseSteps.id, seq: caseSteps.seq, nodeId: caseSteps.nodeId, optionId: caseSteps.optionId, ranking: caseSteps.ranking, answeredAt: caseSteps.answeredAt, answeredBy: users.name })
    .from(caseSteps).leftJoin(users, eq(users.id, caseSteps.answeredBy))
    .where(eq(caseSteps.caseId, caseId)).orderBy(asc(caseSteps.seq));
}

export async function caseEventRows(caseId: number) {
  return db.select({ id: caseEvents.id, kind: caseEvents.kind, fromStatus: caseEvents.fromStatus, toStatus: caseEvents.toStatus, note: caseEvents.note, at: caseEvents.at, by: users.name })
    .from(caseEvents).leftJoin(users, eq(users.id, caseEvents.byUserId))
    .where(eq(caseEvents.caseId, caseId)).orderBy(asc(caseEvents.at), asc(caseEvents.id));
}

/** Booked-in cases whose unit has not reached the bench yet, oldest first. */
export async function waitingForUnit(limit = 8) {
  return db.select({ id: cases.id, reference: cases.reference, status: cases.status, callerName: cases.callerName, symptom: cases.symptom, createdAt: cases.createdAt, triagedAt: cases.triagedAt })
    .from(cases).where(eq(cases.status, "booked_in")).orderBy(asc(cases.triagedAt), asc(cases.id)).limit(limit);
}

export async function caseFilterChoices() {
  const [families, symptoms, technicians] = await Promise.all([
    familyChoices(),
    db.selectDistinct({ symptom: trees.symptom }).from(trees).orderBy(asc(trees.symptom)),
    db.select({ id: users.id, name: users.name }).from(users).where(inArray(users.role, ["admin", "senior", "tech"])).orderBy(asc(users.name)),
  ]);
  return { families, symptoms: symptoms.map((s) => s.symptom), technicians };
}

