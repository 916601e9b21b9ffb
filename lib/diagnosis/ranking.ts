import { effectiveAnswers } from "./answers";
import { concludeFrom } from "./conclusion";
import { buildModel, type ModelCache } from "./model";
import { rankWithPosterior } from "./next-question";
import { computePosterior } from "./posterior";
import { scoresFrom } from "./score";
import type { DxAnswer, DxSettings, DxTree, Ranking } from "./types";

/** How many next-question suggestions a ranking keeps; the triage screen shows the best three not skipped. */
export const RANKING_SUGGESTIONS = 5;

/**
 * The ranking after `answers`: the causes' probabilities (scoreCauses), the best next questions
 * (rankNextQuestions, the first RANKING_SUGGESTIONS) and the suggested conclusion
 * (suggestConclusion), from one model and one posterior. Triage, practice, the seed and the
 * tree review all take their rankings from here. With a ModelCache made for this (unchanging)
 * tree, the checked tree and its likelihood matrices are reused from earlier calls.
 */
export function rankingAfter(tree: DxTree, answers: DxAnswer[], settings?: DxSettings, cache?: ModelCache): Ranking {
  const model = buildModel(tree, settings, cache);
  const resolved = effectiveAnswers(model, answers);
  const posterior = computePosterior(model, resolved);
  const questions = rankWithPosterior(model, resolved, posterior.p);
  const scores = scoresFrom(tree, model, posterior);
  const conclusion = concludeFrom(tree, model, posterior.p, questions);
  return {
    causes: scores.causes.map((c) => ({
      causeId: c.causeId,
      probability: c.probability,
      ruledOutBy: c.ruledOutBy ? { nodeId: c.ruledOutBy.nodeId, optionId: c.ruledOutBy.optionId } : null,
    })),
    unlisted: scores.unlisted,
    suggestions: questions.slice(0, RANKING_SUGGESTIONS).map((q) => ({ nodeId: q.nodeId, gainBits: q.gainBits, gainPerMinute: q.gainPerMinute, separates: [...q.separates] })),
    conclusion: { kind: conclusion.kind, ...(conclusion.causeId ? { causeId: conclusion.causeId } : {}), probability: conclusion.probability },
  };
}
