import { analyseAnswers, type DxAnswer, type DxSettings, type DxTree, type ModelCache } from "@/lib/diagnosis";
import type { StoredRanking } from "./ranking-types";

/** How many next-question suggestions a step keeps; the screen shows the best three not skipped. */
export const STORED_SUGGESTIONS = 5;

/**
 * The ranking the triage screen shows after `answers`, straight from the engine. Pure, so the
 * browser runs it for the optimistic update and the server for the stored, authoritative copy.
 * `models`, made for this very tree, keeps its checked form and likelihoods between calls.
 */
export function computeRanking(tree: DxTree, answers: DxAnswer[], settings: DxSettings, models?: ModelCache): StoredRanking {
  const { scores, questions, conclusion } = analyseAnswers(tree, answers, settings, models);
  const suggestions = questions.slice(0, STORED_SUGGESTIONS);
  return {
    causes: scores.causes.map((c) => ({
      causeId: c.causeId,
      probability: c.probability,
      ruledOutBy: c.ruledOutBy ? { nodeId: c.ruledOutBy.nodeId, optionId: c.ruledOutBy.optionId } : null,
    })),
    unlisted: scores.unlisted,
    suggestions: suggestions.map((s) => ({ nodeId: s.nodeId, gainBits: s.gainBits, gainPerMinute: s.gainPerMinute, separates: [...s.separates] })),
    conclusion: { kind: conclusion.kind, ...(conclusion.causeId ? { causeId: conclusion.causeId } : {}), probability: conclusion.probability },
  };
}

/** True when the unlisted hypothesis is ahead of every listed cause. */
export function unlistedLeads(ranking: Pick<StoredRanking, "causes" | "unlisted" | "conclusion">): boolean {
  if (ranking.conclusion.kind === "unlisted") return true;
  const top = ranking.causes[0]?.probability ?? 0;
  return ranking.unlisted > top;
}
