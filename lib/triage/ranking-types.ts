/**
 * What a case step stores as "the ranking shown" (case_steps.ranking), in engine ids:
 * node and option keys, cause slugs. cases.final_ranking keeps only { slug | "unlisted": p }.
 */
export interface StoredRanking {
  causes: { causeId: string; probability: number; ruledOutBy: { nodeId: string; optionId: string } | null }[];
  unlisted: number;
  suggestions: { nodeId: string; gainBits: number; gainPerMinute: number; separates: string[] }[];
  conclusion: { kind: "cause" | "unlisted" | "continue"; causeId?: string; probability: number };
}

export function finalRankingOf(ranking: Pick<StoredRanking, "causes" | "unlisted">): Record<string, number> {
  const out: Record<string, number> = {};
  for (const c of ranking.causes) out[c.causeId] = c.probability;
  out.unlisted = ranking.unlisted;
  return out;
}
