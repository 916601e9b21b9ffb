import { DiagnosisError } from "./errors";

/** Counts of one column (answers to one question by cases of one cause) and the distribution a prior centres on. */
export interface CountColumn {
  counts: ArrayLike<number>;
  /** Prior mean over the same outcomes, summing to 1; 0 only where nothing was counted. */
  mean: ArrayLike<number>;
}

/** Above this precision a column is indistinguishable from its mean for any history a shop has. */
export const MAX_PRECISION = 1e6;
const MIN_PRECISION = 1e-3;

/**
 * log Γ(x + n) − log Γ(x) for a whole number n: Σ_{j<n} log(x + j). Exact for the integer counts
 * learning deals in, so the marginal likelihood needs no special functions.
 */
function logRising(x: number, n: number): number {
  let s = 0;
  for (let j = 0; j < n; j++) s += Math.log(x + j);
  return s;
}

function checkColumn({ counts, mean }: CountColumn): void {
  if (counts.length !== mean.length || counts.length === 0) {
    throw new DiagnosisError("bad_count", "A count column and its mean must have the same, non-zero length");
  }
  let total = 0;
  for (let o = 0; o < counts.length; o++) {
    if (!(Number.isInteger(counts[o]) && counts[o] >= 0)) throw new DiagnosisError("bad_count", `Counts must be whole numbers ≥ 0, got ${String(counts[o])}`);
    if (!(mean[o] >= 0 && mean[o] <= 1)) throw new DiagnosisError("bad_probability", `A prior mean must be in [0, 1], got ${String(mean[o])}`);
    if (mean[o] === 0 && counts[o] > 0) throw new DiagnosisError("bad_probability", "A prior mean of 0 cannot explain an outcome that was counted");
    total += mean[o];
  }
  if (Math.abs(total - 1) > 1e-9) throw new DiagnosisError("bad_probability", `A prior mean must sum to 1, got ${total}`);
}

/**
 * Log Dirichlet–multinomial marginal likelihood of a column's counts under Dirichlet(s·mean),
 * without the multinomial coefficient (it does not depend on the prior):
 *   log Γ(s) − log Γ(N + s) + Σ_o [log Γ(n_o + s·mean_o) − log Γ(s·mean_o)].
 * s = Infinity gives the multinomial at the mean itself, Σ_o n_o log mean_o.
 */
export function logMarginalLikelihood(column: CountColumn, s: number): number {
  checkColumn(column);
  return logMarginal(column, s);
}

function logMarginal({ counts, mean }: CountColumn, s: number): number {
  let total = 0;
  let value = 0;
  for (let o = 0; o < counts.length; o++) {
    total += counts[o];
    if (counts[o] === 0) continue;
    value += s === Infinity ? counts[o] * Math.log(mean[o]) : logRising(s * mean[o], counts[o]);
  }
  return s === Infinity ? value : value - logRising(s, total);
}

/**
 * First and second derivatives of Σ_c log L_c(s) with respect to t = log s, from the digamma and
 * trigamma differences ψ(x + n) − ψ(x) = Σ_{j<n} 1/(x + j) and ψ'(x + n) − ψ'(x) = −Σ_{j<n} 1/(x + j)².
 */
function slopes(columns: CountColumn[], s: number): { d1: number; d2: number } {
  let g = 0;
  let h = 0;
  for (const { counts, mean } of columns) {
    let total = 0;
    for (let o = 0; o < counts.length; o++) {
      const x = s * mean[o];
      for (let j = 0; j < counts[o]; j++) {
        g += mean[o] / (x + j);
        h -= (mean[o] * mean[o]) / ((x + j) * (x + j));
      }
      total += counts[o];
    }
    for (let j = 0; j < total; j++) {
      g -= 1 / (s + j);
      h += 1 / ((s + j) * (s + j));
    }
  }
  return { d1: s * g, d2: s * g + s * s * h };
}

/**
 * The precision s of Dirichlet(s·mean) that maximises the Dirichlet–multinomial marginal likelihood
 * of the columns (each with its own mean, all sharing s): empirical Bayes for the Pólya distribution
 * with its mean fixed, after Minka, "Estimating a Dirichlet distribution" (2000), by Newton's method
 * on log s, kept inside a bracket of the root of the derivative so that it always converges.
 * Returns Infinity where the counts are no more spread than the means themselves would make them
 * (the likelihood still rises at MAX_PRECISION): the history then has nothing to say against them.
 */
export function estimatePrecision(columns: CountColumn[]): number {
  columns.forEach(checkColumn);
  let lo = Math.log(MIN_PRECISION);
  let hi = Math.log(MAX_PRECISION);
  if (slopes(columns, MAX_PRECISION).d1 >= 0) return Infinity;
  if (slopes(columns, MIN_PRECISION).d1 <= 0) return MIN_PRECISION;
  let t = (lo + hi) / 2;
  for (let i = 0; i < 200; i++) {
    const { d1, d2 } = slopes(columns, Math.exp(t));
    if (d1 > 0) lo = t;
    else hi = t;
    const newton = d2 < 0 ? t - d1 / d2 : NaN;
    const next = newton > lo && newton < hi ? newton : (lo + hi) / 2;
    if (Math.abs(next - t) < 1e-10) return Math.exp(next);
    t = next;
  }
  return Math.exp(t);
}

/** Posterior mean of a column under Dirichlet(s·mean): (n_o + s·mean_o) / (N + s); the mean itself for s = Infinity. */
export function posteriorMean({ counts, mean }: CountColumn, s: number): number[] {
  if (s === Infinity) return Array.from(mean);
  let total = 0;
  for (let o = 0; o < counts.length; o++) total += counts[o];
  return Array.from(counts, (n, o) => (total + s > 0 ? (n + s * mean[o]) / (total + s) : mean[o]));
}

/**
 * log Bayes factor of "the column's answers follow some other distribution" (a uniform Dirichlet
 * prior over the outcomes, the Bayes–Laplace prior) against "they follow the mean exactly": the
 * Dirichlet–multinomial marginal likelihood over the multinomial one. It weighs the size of a
 * difference against the number of cases behind it.
 */
export function logBayesFactorAgainstMean(column: CountColumn): number {
  checkColumn(column);
  const m = column.counts.length;
  const uniform = { counts: column.counts, mean: Array.from({ length: m }, () => 1 / m) };
  return logMarginal(uniform, m) - logMarginal(column, Infinity);
}
