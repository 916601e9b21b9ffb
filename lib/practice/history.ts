import "server-only";
import { desc, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { cases, causes, motorFamilies, practiceAttempts } from "@/db/schema";

/** A trainee's practice record: cases done, top-1 hits, and the latest attempts. */
export async function practiceHistory(traineeId: string, recent = 5) {
  const [[totals], last] = await Promise.all([
    db
      .select({
        casesDone: sql<number>`count(distinct ${practiceAttempts.caseId}) filter (where ${practiceAttempts.finishedAt} is not null)::int`,
        attempts: sql<number>`count(*) filter (where ${practiceAttempts.finishedAt} is not null)::int`,
        hits: sql<number>`count(*) filter (where ${practiceAttempts.hit})::int`,
      })
      .from(practiceAttempts)
      .where(eq(practiceAttempts.traineeId, traineeId)),
    db
      .select({
        id: practiceAttempts.id,
        caseId: practiceAttempts.caseId,
        hit: practiceAttempts.hit,
        revealedSteps: practiceAttempts.revealedSteps,
        finishedAt: practiceAttempts.finishedAt,
        symptom: cases.symptom,
        family: sql<string>`${motorFamilies.name} || ' ' || ${motorFamilies.generation}`,
        committed: causes.name,
      })
      .from(practiceAttempts)
      .innerJoin(cases, eq(cases.id, practiceAttempts.caseId))
      .innerJoin(motorFamilies, eq(motorFamilies.id, cases.familyId))
      .leftJoin(causes, eq(causes.id, practiceAttempts.committedCauseId))
      .where(sql`${practiceAttempts.traineeId} = ${traineeId} and ${practiceAttempts.finishedAt} is not null`)
      .orderBy(desc(practiceAttempts.finishedAt), desc(practiceAttempts.id))
      .limit(recent),
  ]);
  return { ...totals, recent: last };
}
export type PracticeHistory = Awaited<ReturnType<typeof practiceHistory>>;
