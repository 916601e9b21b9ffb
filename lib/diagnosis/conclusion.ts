import { effectiveAnswers } from "./answers";
import { buildModel, type Model } from "./model";
import { rankWithPosterior } from "./next-question";
import { computePosterior } from "./posterior";
import type { Conclusion, DxAnswer, DxSettings, DxTree, RankedQuestion } from "./types";

/**
 * "cause" when the top cause reaches settings.stopThreshold (0.8); "unlisted" when the
 * unlisted hypothesis reaches it. Otherwise, when no remaining node gains more than
 * settings.minGainBits (0.05), conclude with whichever leads; else "continue".
 * `probability` is always the leader's; `causeId` is set when the leader is a listed cause
 * (a listed cause wins a tie with unlisted).
 */
export function suggestConclusion(tree: DxTree, answers: DxAnswer[], settings?: DxSettings): Conclusion {
  const model = buildModel(tree, settings);
  const resolved = effectiveAnswers(model, answers);
  const { p } = computePosterior(model, resolved);
  return concludeFrom(tree, model, p, () => rankWithPosterior(model, resolved, p));
}

/** The stop rule on a computed posterior; `questions` may be passed lazily (only needed below the threshold). */
export function concludeFrom(tree: DxTree, model: Model, p: Float64Array, questions: RankedQuestion[] | (() => RankedQuestion[])): Conclusion {
  const { stopThreshold, minGainBits } = model.settings;

  let top = -1;
  for (let k = 0; k < model.K; k++) if (top < 0 || p[k] > p[top]) top = k;
  const topP = top >= 0 ? p[top] : 0;
  const unlisted = model.hasUnlisted ? p[model.K] : 0;
  const causeLeads = top >= 0 && topP >= unlisted;
  const leader = causeLeads ? { causeId: tree.causes[top].id, probability: topP } : { probability: unlisted };

  if (causeLeads && topP >= stopThreshold) return { kind: "cause", ...leader };
  if (!causeLeads && unlisted >= stopThreshold) return { kind: "unlisted", ...leader };

  const ranked = typeof questions === "function" ? questions() : questions;
  const informative = ranked.some((q) => q.gainBits > minGainBits);
  if (!informative) return { kind: causeLeads ? "cause" : "unlisted", ...leader };
  return { kind: "continue", ...leader };
}
