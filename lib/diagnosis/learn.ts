import { effectiveAnswers } from "./answers";
import { requireNonNegative } from "./guards";
import { nodeLikelihood } from "./likelihood";
import { buildModel } from "./model";
import type { ClosedCase, DxTree, EvidenceSuggestion, LearnedLikelihoods } from "./types";

export const DEFAULT_LEARNING_STRENGTH = 5;
const REVIEW_DIFFERENCE = 0.25;
const REVIEW_MIN_CASES = 10;

/**
 * P̂(o|q,k) = (N(q,o,k) + m·P_editor(o|q,k)) / (N(q,·,k) + m) from closed cases, where a
 * case counts once per node (its last answer there) and "don't know" answers are not counted.
 * Cases whose confirmed cause is not in the tree say nothing about the listed causes and are
 * skipped. P_editor uses the default strength weights. A review suggestion is raised where
 * |learned − authored| > 0.25 with N(q,·,k) ≥ 10.
 */
export function learnLikelihoods(tree: DxTree, closed: ClosedCase[], m: number = DEFAULT_LEARNING_STRENGTH): LearnedLikelihoods {
  requireNonNegative(m, "learning strength m", "bad_setting");
  const model = buildModel(tree);
  const counts = new Map<number, Map<number, Float64Array>>();

  for (const c of closed) {
    const k = model.causeIndex.get(c.confirmedCauseId);
    const answers = effectiveAnswers(model, c.answers);
    if (k === undefined) continue;
    for (const a of answers) {
      if (a.outcome < 0) continue;
      const byCause = counts.get(a.node) ?? new Map<number, Float64Array>();
      counts.set(a.node, byCause);
      const row = byCause.get(k) ?? new Float64Array(model.outcomesOf[a.node].length);
      byCause.set(k, row);
      row[a.outcome] += 1;
    }
  }

  const likelihoods: Record<string, Record<string, number>> = {};
  const suggestions: EvidenceSuggestion[] = [];
  const nodes = [...counts.keys()].sort((a, b) => a - b);
  for (const n of nodes) {
    const { L } = nodeLikelihood(model, n);
    const outcomes = model.outcomesOf[n];
    const byCause = counts.get(n) as Map<number, Float64Array>;
    for (const k of [...byCause.keys()].sort((a, b) => a - b)) {
      const row = byCause.get(k) as Float64Array;
      const cases = row.reduce((s, x) => s + x, 0);
      const causeId = tree.causes[k].id;
      outcomes.forEach((option, o) => {
        const authored = L[o * model.H + k];
        const learned = (row[o] + m * authored) / (cases + m);
        (likelihoods[option.id] ??= {})[causeId] = learned;
        if (cases >= REVIEW_MIN_CASES && Math.abs(learned - authored) > REVIEW_DIFFERENCE) {
          suggestions.push({ optionId: option.id, causeId, authored, learned, cases });
        }
      });
    }
  }
  return { likelihoods, suggestions };
}
