import { effectiveAnswers } from "./answers";
import { buildModel, type Model } from "./model";
import { computePosterior, type Posterior } from "./posterior";
import type { CauseScores, DxAnswer, DxSettings, DxTree } from "./types";

/** Causes by probability, descending (ties keep tree order); causes plus unlisted sum to 1. */
export function scoreCauses(tree: DxTree, answers: DxAnswer[], settings?: DxSettings): CauseScores {
  const model = buildModel(tree, settings);
  return scoresFrom(tree, model, computePosterior(model, effectiveAnswers(model, answers)));
}

export function scoresFrom(tree: DxTree, model: Model, { p, ruledOutBy }: Posterior): CauseScores {
  const causes = tree.causes
    .map((c, k) => ({ causeId: c.id, probability: p[k], ruledOutBy: ruledOutBy[k], k }))
    .sort((a, b) => b.probability - a.probability || a.k - b.k)
    .map(({ causeId, probability, ruledOutBy: by }) => ({ causeId, probability, ruledOutBy: by }));
  return { causes, unlisted: model.hasUnlisted ? p[model.K] : 0 };
}
