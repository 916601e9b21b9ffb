import "server-only";
import { and, eq, inArray, isNotNull } from "drizzle-orm";
import type { Tx } from "@/db";
import { cases, causes, outcomeCauses, triageScores } from "@/db/schema";
import { rankingRowScore } from "@/lib/diagnosis";

export const UNLISTED = "unlisted";
const CHUNK = 1000;

/**
 * The truth a ranking is scored against: the primary confirmed cause. A confirmed cause the tree
 * does not list (or an "other" outcome) is the tree's unlisted hypothesis being right.
 */
export function truthFor(ranking: Record<string, number>, primarySlug: string | null): string {
  return primarySlug && Object.hasOwn(ranking, primarySlug) && primarySlug !== UNLISTED ? primarySlug : UNLISTED;
}

/**
 * (Re)writes the triage scores of these cases from their final ranking and their bench outcome's
 * primary cause as stored now. Every writer of a bench outcome calls it in the outcome's own
 * transaction (after the case row lock), so a score never disagrees with the outcome it scores.
 * A case without a final ranking (an imported record) has no score.
 */
export async function storeTriageScores(tx: Tx, caseIds: number[]): Promise<void> {
  for (let i = 0; i < caseIds.length; i += CHUNK) await storeChunk(tx, caseIds.slice(i, i + CHUNK));
}

async function storeChunk(tx: Tx, ids: number[]): Promise<void> {
  const rows = await tx.select({ id: cases.id, ranking: cases.finalRanking, primary: causes.slug })
    .from(cases)
    .leftJoin(outcomeCauses, and(eq(outcomeCauses.caseId, cases.id), eq(outcomeCauses.primary, true)))
    .leftJoin(causes, eq(causes.id, outcomeCauses.causeId))
    .where(and(inArray(cases.id, ids), isNotNull(cases.finalRanking)));
  await tx.delete(triageScores).where(inArray(triageScores.caseId, ids));
  if (rows.length === 0) return;
  await tx.insert(triageScores).values(rows.map((r) => {
    const ranking = r.ranking!;
    const s = rankingRowScore({ probabilities: ranking, confirmed: truthFor(ranking, r.primary) });
    return {
      caseId: r.id, confirmedRank: Number.isFinite(s.rank) ? s.rank : null,
      confirmedP: s.confirmedP, topP: s.topP, brier: s.brier, logLoss: s.logLoss,
    };
  }));
}
