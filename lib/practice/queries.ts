import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { caseOutcomes, cases, caseSteps, causes, motorFamilies, outcomeCauses, outcomeParts, parts, trees, treeVersions } from "@/db/schema";
import { AppError } from "@/lib/errors";
import { answersOf, caseRanking } from "@/lib/triage/answer";
import { loadCaseContext } from "@/lib/triage/context";
import type { StoredRanking } from "@/lib/triage/ranking-types";
import { publishedTree } from "@/lib/triage/tree-cache";
import { buildReplay } from "./replay";
import type { PracticeReplay } from "./types";

export const PRACTICE_PAGE_SIZE = 25;

const familyLabel = sql<string>`${motorFamilies.name} || ' ' || ${motorFamilies.generation}`;
// A case can be practised when it is closed, was walked (has steps) and the bench confirmed a cause.
const practisable = sql`${cases.status} = 'closed'
  and exists (select 1 from ${caseSteps} where ${caseSteps.caseId} = ${cases.id})
  and exists (select 1 from ${outcomeCauses} where ${outcomeCauses.caseId} = ${cases.id})`;

/** Closed cases to practise on, newest first. Only what the trainee may see: no caller, contact or serial. */
export async function listPracticeCases(userId: string, options: { page?: number; family?: string } = {}) {
  const page = Math.max(1, options.page ?? 1);
  const where = options.family ? and(practisable, eq(motorFamilies.slug, options.family)) : practisable;
  const [rows, [{ total }], families] = await Promise.all([
    db
      .select({
        id: cases.id,
        symptom: cases.symptom,
        ridingUse: cases.ridingUse,
        callerKind: cases.callerKind,
        closedAt: cases.closedAt,
        family: familyLabel,
        treeTitle: trees.title,
        steps: sql<number>`(select count(*)::int from ${caseSteps} where ${caseSteps.caseId} = ${cases.id})`,
        attempts: sql<number>`(select count(*)::int from practice_attempts a where a.case_id = ${cases.id} and a.trainee_id = ${userId} and a.finished_at is not null)`,
      })
      .from(cases)
      .innerJoin(motorFamilies, eq(motorFamilies.id, cases.familyId))
      .innerJoin(treeVersions, eq(treeVersions.id, cases.treeVersionId))
      .innerJoin(trees, eq(trees.id, treeVersions.treeId))
      .where(where)
      .orderBy(sql`${cases.closedAt} desc nulls last`, sql`${cases.id} desc`)
      .limit(PRACTICE_PAGE_SIZE)
      .offset((page - 1) * PRACTICE_PAGE_SIZE),
    db.select({ total: sql<number>`count(*)::int` }).from(cases).innerJoin(motorFamilies, eq(motorFamilies.id, cases.familyId)).where(where),
    db.select({ slug: motorFamilies.slug, name: familyLabel }).from(motorFamilies).orderBy(asc(motorFamilies.name), asc(motorFamilies.generation)),
  ]);
  return { rows, total, page, pages: Math.max(1, Math.ceil(total / PRACTICE_PAGE_SIZE)), families };
}
export type PracticeCaseRow = Awaited<ReturnType<typeof listPracticeCases>>["rows"][number];

async function practiceCaseRow(caseId: number) {
  const [row] = await db
    .select({
      id: cases.id, symptom: cases.symptom, ridingUse: cases.ridingUse, callerKind: cases.callerKind,
      treeVersionId: cases.treeVersionId, family: familyLabel, treeTitle: trees.title,
    })
    .from(cases)
    .innerJoin(motorFamilies, eq(motorFamilies.id, cases.familyId))
    .innerJoin(treeVersions, eq(treeVersions.id, cases.treeVersionId))
    .innerJoin(trees, eq(trees.id, treeVersions.treeId))
    .where(and(eq(cases.id, caseId), practisable))
    .limit(1);
  if (!row) throw new AppError("not_found", "That case is not open for practice: it must be closed, walked and confirmed at the bench.");
  return row;
}

/** The replay of one case for its practice page; the bench result stays on the server. */
export async function loadPracticeReplay(caseId: number): Promise<PracticeReplay> {
  const row = await practiceCaseRow(caseId);
  const [steps, ctx] = await Promise.all([
    db.select({ nodeId: caseSteps.nodeId, optionId: caseSteps.optionId, ranking: caseSteps.ranking }).from(caseSteps).where(eq(caseSteps.caseId, caseId)).orderBy(asc(caseSteps.seq)),
    loadCaseContext(caseId, { historyAsOfStart: true }),
  ]);
  if (!ctx) throw new AppError("not_found", "That case does not exist.");
  const tree = await publishedTree(ctx.treeVersionId);
  return buildReplay(
    { caseId: row.id, family: row.family, symptom: row.symptom, treeTitle: row.treeTitle, ridingUse: row.ridingUse, callerKind: row.callerKind },
    tree.graph,
    steps.map((s) => ({ nodeId: s.nodeId, optionId: s.optionId, ranking: s.ranking as StoredRanking })),
    caseRanking(tree, answersOf(tree, []), ctx),
  );
}

/** What the bench found: shown only after the trainee has committed to a cause. */
export async function loadBenchFindings(caseId: number) {
  await practiceCaseRow(caseId);
  const [confirmed, partRows, [outcome]] = await Promise.all([
    db.select({ id: causes.id, slug: causes.slug, name: causes.name, primary: outcomeCauses.primary })
      .from(outcomeCauses).innerJoin(causes, eq(causes.id, outcomeCauses.causeId))
      .where(eq(outcomeCauses.caseId, caseId)).orderBy(sql`${outcomeCauses.primary} desc`, asc(causes.name)),
    db.select({ name: parts.name, quantity: outcomeParts.quantity })
      .from(outcomeParts).innerJoin(parts, eq(parts.id, outcomeParts.partId))
      .where(eq(outcomeParts.caseId, caseId)).orderBy(asc(parts.name)),
    db.select().from(caseOutcomes).where(eq(caseOutcomes.caseId, caseId)).limit(1),
  ]);
  return { confirmed, parts: partRows, outcome: outcome ?? null };
}
