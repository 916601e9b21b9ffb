import { effectiveAnswers } from "./answers";
import { concludeFrom } from "./conclusion";
import { buildModel, type ModelCache } from "./model";
import { rankWithPosterior } from "./next-question";
import { computePosterior } from "./posterior";
import { scoresFrom } from "./score";
import type { CauseScores, Conclusion, DxAnswer, DxSettings, DxTree, RankedQuestion } from "./types";

export interface Analysis {
  scores: CauseScores;
  questions: RankedQuestion[];
  conclusion: Conclusion;
}

/**
 * scoreCauses, rankNextQuestions and suggestConclusion in one pass: one model, one posterior and
 * one ranking instead of three of each (the triage answer path calls all three on every answer).
 * With a ModelCache made for this (unchanging) tree, the checked tree and its likelihood matrices
 * are reused from earlier calls.
 */
export function analyseAnswers(tree: DxTree, answers: DxAnswer[], settings?: DxSettings, cache?: ModelCache): Analysis {
  const model = buildModel(tree, settings, cache);
  const resolved = effectiveAnswers(model, answers);
  const posterior = computePosterior(model, resolved);
  const questions = rankWithPosterior(model, resolved, posterior.p);
  return {
    scores: scoresFrom(tree, model, posterior),
    questions,
    conclusion: concludeFrom(tree, model, posterior.p, questions),
  };
}
