import type { Ranking } from "@/lib/diagnosis";

/**
 * What a case step stores as "the ranking shown" (case_steps.ranking): the engine's ranking
 * (rankingAfter) in engine ids, i.e. node and option keys and cause slugs.
 * cases.final_ranking keeps only { slug | "unlisted": p }.
 */
export type StoredRanking = Ranking;

export function finalRankingOf(ranking: Pick<StoredRanking, "causes" | "unlisted">): Record<string, number> {
  const out: Record<string, number> = {};
  for (const c of ranking.causes) out[c.causeId] = c.probability;
  out.unlisted = ranking.unlisted;
  return out;
}

/** True when the unlisted hypothesis is ahead of every listed cause. */
export function unlistedLeads(ranking: Pick<StoredRanking, "causes" | "unlisted" | "conclusion">): boolean {
  if (ranking.conclusion.kind === "unlisted") return true;
  const top = ranking.causes[0]?.probability ?? 0;
  return ranking.unlisted > top;
}
