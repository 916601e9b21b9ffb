import { effectiveAnswers } from "./answers";
import { estimatePrecision, logBayesFactorAgainstMean, logMarginalLikelihood, posteriorMean, type CountColumn } from "./dirichlet";
import { requireNonNegative } from "./guards";
import { nodeLikelihood } from "./likelihood";
import { buildModel } from "./model";
import type { ClosedCase, DxSettings, DxTree, EvidenceColumn, LearnedLikelihoods } from "./types";

/** The fixed strength of the original m-estimate, kept for comparison and for callers that pin it. */
export const DEFAULT_LEARNING_STRENGTH = 5;
/** Below this many cases a column's own strength estimate is too noisy; the tree-wide one stands in. */
export const MIN_COLUMN_CASES = 20;
/**
 * Bayes factor from which a column is put to review: 20, where Kass & Raftery ("Bayes factors",
 * JASA 1995, p. 777) begin "strong" evidence.
 */
export const REVIEW_BAYES_FACTOR = 20;
/** χ² with 1 degree of freedom at the 5% level (any statistics table). */
const CHI2_1DF_95 = 3.841;
/** Stands in for an authored 0 that the history contradicts, so the contradiction can be weighed at all. */
const ZERO_FLOOR = 1e-3;

interface Tally {
  node: number;
  k: number;
  counts: Float64Array;
}

function tally(tree: DxTree, closed: ClosedCase[], model: ReturnType<typeof buildModel>): Tally[] {
  const byKey = new Map<number, Tally>();
  for (const c of closed) {
    const answers = effectiveAnswers(model, c.answers);
    const k = model.causeIndex.get(c.confirmedCauseId);
    if (k === undefined) continue;
    for (const a of answers) {
      if (a.outcome < 0) continue;
      const key = a.node * model.K + k;
      let t = byKey.get(key);
      if (!t) byKey.set(key, (t = { node: a.node, k, counts: new Float64Array(model.outcomesOf[a.node].length) }));
      t.counts[a.outcome] += 1;
    }
  }
  return [...byKey.entries()].sort((a, b) => a[0] - b[0]).map(([, t]) => t);
}

/** The authored column as a prior mean: zeros the counts contradict are lifted to a small floor. */
function priorMean(authored: number[], counts: Float64Array): number[] {
  if (!authored.some((p, o) => p === 0 && counts[o] > 0)) return authored;
  const lifted = authored.map((p) => p + ZERO_FLOOR);
  const sum = lifted.reduce((a, b) => a + b, 0);
  return lifted.map((p) => p / sum);
}

/**
 * Whether a column's own strength fits its counts clearly better than the tree-wide one: a
 * likelihood-ratio test at the 5% level, 2·Δlog L against χ² with one degree of freedom (Wilks,
 * 1938). With s = ∞ on the boundary the test is conservative, which is the safe side here: a
 * single column's estimate is noisy, and a column that does not clearly stand out keeps the pull
 * the whole tree's history supports.
 */
function rejectsTreeStrength(column: CountColumn, own: number, tree: number): boolean {
  return 2 * (logMarginalLikelihood(column, own) - logMarginalLikelihood(column, tree)) > CHI2_1DF_95;
}

/**
 * Learned likelihoods from closed cases. Each question-and-cause column's counts N(q,o,k) (a case
 * counts once per node, its last answer there; "don't know" answers and causes outside the tree
 * are not counted) update a Dirichlet prior centred on the authored column P_editor(o|q,k), itself
 * computed with the weight table in `settings.weights`:
 *   P̂(o|q,k) = (N(q,o,k) + s·P_editor(o|q,k)) / (N(q,·,k) + s).
 * Without `strength`, s is chosen from the history: the s that maximises the Dirichlet–multinomial
 * marginal likelihood over all columns of the tree (estimatePrecision), and for a column with at
 * least MIN_COLUMN_CASES cases its own maximiser where that fits it clearly better (rejectsTreeStrength).
 * A column the history agrees with gets s = ∞ and keeps the authored values; one it contradicts
 * gets a small s and moves toward its counts. A number `strength` fixes s for every column.
 * Every column gets a Bayes factor against the authored values; from REVIEW_BAYES_FACTOR on it
 * is a review suggestion.
 */
export function learnLikelihoods(tree: DxTree, closed: ClosedCase[], strength?: number, settings: Pick<DxSettings, "weights"> = {}): LearnedLikelihoods {
  if (strength !== undefined) requireNonNegative(strength, "learning strength", "bad_setting");
  const model = buildModel(tree, { weights: settings.weights });
  const columns = tally(tree, closed, model)
    .filter((t) => t.counts.length >= 2)
    .map((t) => {
      const { L } = nodeLikelihood(model, t.node);
      const authored = Array.from(t.counts, (_, o) => L[o * model.H + t.k]);
      const prior: CountColumn = { counts: t.counts, mean: priorMean(authored, t.counts) };
      return { ...t, authored, prior, cases: t.counts.reduce((a, b) => a + b, 0) };
    });

  const treeStrength = strength ?? estimatePrecision(columns.map((c) => c.prior));
  const likelihoods: Record<string, Record<string, number>> = {};
  const evidence: EvidenceColumn[] = columns.map((c) => {
    const own = strength === undefined && c.cases >= MIN_COLUMN_CASES ? estimatePrecision([c.prior]) : treeStrength;
    const fromColumn = own !== treeStrength && rejectsTreeStrength(c.prior, own, treeStrength);
    const s = fromColumn ? own : treeStrength;
    const learned = c.cases + s > 0 ? posteriorMean(c.prior, s) : c.authored;
    const outcomes = model.outcomesOf[c.node];
    const causeId = tree.causes[c.k].id;
    outcomes.forEach((option, o) => ((likelihoods[option.id] ??= {})[causeId] = learned[o]));
    return {
      nodeId: tree.nodes[c.node].id,
      causeId,
      optionIds: outcomes.map((o) => o.id),
      counts: Array.from(c.counts),
      cases: c.cases,
      authored: c.authored,
      learned,
      strength: s,
      strengthFrom: strength !== undefined ? "fixed" : fromColumn ? "column" : "tree",
      logBayesFactor: logBayesFactorAgainstMean(c.prior),
    };
  });
  const threshold = Math.log(REVIEW_BAYES_FACTOR);
  return { likelihoods, treeStrength, columns: evidence, suggestions: evidence.filter((c) => c.logBayesFactor >= threshold) };
}
