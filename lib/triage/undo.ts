import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { cases, caseSteps } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { AppError } from "@/lib/errors";
import { anticipateForCase, answersOf, assertOpen, rankingFor } from "./answer";
import { loadCaseContext } from "./context";
import { rememberUndone } from "./context-cache";
import { undoInput } from "./inputs";
import type { StoredRanking } from "./ranking-types";
import { publishedTree } from "./tree-cache";

export interface UndoneStep {
  removedSeq: number;
  /** The ranking shown before the removed answer: the previous step's, or the starting one. */
  ranking: StoredRanking;
}

/** Removes exactly the last step, and only if it is the one the caller saw as last. */
export async function undoLastStep(caseId: number, seq: number): Promise<UndoneStep> {
  const previous = await db.transaction(async (tx) => {
    const [row] = await tx.select({ reference: cases.reference, status: cases.status }).from(cases).where(eq(cases.id, caseId)).for("update");
    if (!row) throw new AppError("not_found", "That case does not exist.");
    assertOpen(row);
    const [last, before] = await tx
      .select({ id: caseSteps.id, seq: caseSteps.seq, ranking: caseSteps.ranking })
      .from(caseSteps).where(eq(caseSteps.caseId, caseId)).orderBy(desc(caseSteps.seq)).limit(2);
    if (!last) throw new AppError("conflict", "There is no answer to undo.");
    if (last.seq !== seq) throw new AppError("conflict", `Answer ${seq} is not the last one any more (the last is ${last.seq}); reload the case.`);
    await tx.delete(caseSteps).where(and(eq(caseSteps.id, last.id), eq(caseSteps.caseId, caseId)));
    await tx.update(cases).set({ updatedAt: new Date() }).where(eq(cases.id, caseId));
    return { removedId: last.id, ranking: before ? (before.ranking as StoredRanking) : null };
  });
  rememberUndone(caseId, previous.removedId);
  const ranking = previous.ranking ?? (await startingRanking(caseId));
  anticipateForCase(caseId, ranking).catch(() => {});
  return { removedSeq: seq, ranking };
}

/** The ranking before any answer: priors only, from the shop's history for the motor family. */
export async function startingRanking(caseId: number): Promise<StoredRanking> {
  const ctx = await loadCaseContext(caseId);
  if (!ctx) throw new AppError("not_found", "That case does not exist.");
  const tree = await publishedTree(ctx.treeVersionId);
  return rankingFor(tree, answersOf(tree, []), ctx);
}

export const undoStepAction = defineAction({
  name: "cases.undo",
  access: "case:work",
  input: undoInput,
  run: (input) => undoLastStep(input.caseId, input.seq),
});
