import { describe, expect, it } from "vitest";
import {
  DiagnosisError,
  estimatePrecision,
  logBayesFactorAgainstMean,
  logMarginalLikelihood,
  posteriorMean,
  type CountColumn,
} from "@/lib/diagnosis";

// Reference values computed with SciPy 1.17 (a general-purpose reference): the log marginal with
// scipy.special.gammaln as gammaln(s) − gammaln(N+s) + Σ gammaln(n+s·p) − gammaln(s·p), and the
// maximiser with scipy.optimize.minimize_scalar(method="bounded") over log s in [log 1e-3, log 1e6].
describe("Dirichlet–multinomial marginal likelihood", () => {
  it("matches SciPy's log-gamma evaluation", () => {
    expect(logMarginalLikelihood({ counts: [7, 2, 1], mean: [0.6, 0.3, 0.1] }, 4)).toBeCloseTo(-9.45265883871582, 10); // SciPy
    expect(logMarginalLikelihood({ counts: [12, 0, 3], mean: [0.2, 0.5, 0.3] }, 10)).toBeCloseTo(-15.336393502685326, 10); // SciPy
    expect(logMarginalLikelihood({ counts: [3, 9], mean: [0.75, 0.25] }, 2.5)).toBeCloseTo(-8.934791627514922, 10); // SciPy
  });

  it("tends to the multinomial at the mean as the precision grows", () => {
    const column = { counts: [7, 2, 1], mean: [0.6, 0.3, 0.1] };
    const multinomial = 7 * Math.log(0.6) + 2 * Math.log(0.3) + Math.log(0.1);
    expect(logMarginalLikelihood(column, Infinity)).toBeCloseTo(multinomial, 12);
    expect(logMarginalLikelihood(column, 1e7)).toBeCloseTo(multinomial, 4);
  });

  it("rejects counts that are not whole numbers and means that do not sum to 1", () => {
    expect(() => logMarginalLikelihood({ counts: [1.5, 2], mean: [0.5, 0.5] }, 1)).toThrow(DiagnosisError);
    expect(() => logMarginalLikelihood({ counts: [1, 2], mean: [0.5, 0.6] }, 1)).toThrow(DiagnosisError);
    expect(() => logMarginalLikelihood({ counts: [1, 2], mean: [0, 1] }, 1)).toThrow(DiagnosisError);
  });
});

describe("estimatePrecision (empirical Bayes, Minka 2000, Newton on log s)", () => {
  it("finds the maximiser SciPy finds, for one column and for several sharing a precision", () => {
    expect(estimatePrecision([{ counts: [2, 10], mean: [0.75, 0.25] }])).toBeCloseTo(0.9354350694078232, 5); // SciPy
    expect(estimatePrecision([{ counts: [12, 3, 5], mean: [0.7, 0.2, 0.1] }])).toBeCloseTo(35.415216822057864, 4); // SciPy
    const three: CountColumn[] = [
      { counts: [2, 10], mean: [0.75, 0.25] },
      { counts: [12, 3, 5], mean: [0.7, 0.2, 0.1] },
      { counts: [5, 5], mean: [0.5, 0.5] },
    ];
    expect(estimatePrecision(three)).toBeCloseTo(4.095037053058712, 5); // SciPy
    const two: CountColumn[] = [
      { counts: [30, 10, 0, 4], mean: [0.25, 0.25, 0.25, 0.25] },
      { counts: [1, 20, 3], mean: [0.6, 0.3, 0.1] },
    ];
    expect(estimatePrecision(two)).toBeCloseTo(1.4243513607668787, 5); // SciPy
  });

  it("no precision on a fine grid beats the estimate (brute force)", () => {
    const column = { counts: [9, 4, 6, 1], mean: [0.4, 0.4, 0.1, 0.1] };
    const s = estimatePrecision([column]);
    const best = logMarginalLikelihood(column, s);
    for (let t = -6; t <= 13; t += 0.01) expect(logMarginalLikelihood(column, Math.exp(t))).toBeLessThanOrEqual(best + 1e-9);
  });

  it("is infinite for counts that follow the mean exactly: the history has nothing against it", () => {
    for (const n of [4, 20, 100, 1000]) {
      expect(estimatePrecision([{ counts: [n * 0.75, n * 0.25], mean: [0.75, 0.25] }])).toBe(Infinity);
      expect(estimatePrecision([{ counts: [n * 0.5, n * 0.25, n * 0.25], mean: [0.5, 0.25, 0.25] }])).toBe(Infinity);
    }
    expect(posteriorMean({ counts: [75, 25], mean: [0.75, 0.25] }, Infinity)).toEqual([0.75, 0.25]);
  });

  it("falls as the counts contradict the mean more strongly", () => {
    const mean = [0.75, 0.25];
    const strengths = [[12, 8], [10, 10], [6, 14], [2, 18]].map((counts) => estimatePrecision([{ counts, mean }]));
    for (let i = 1; i < strengths.length; i++) expect(strengths[i]).toBeLessThan(strengths[i - 1]);
  });
});

describe("posteriorMean", () => {
  it("is the m-estimate (n + s·p) / (N + s)", () => {
    const got = posteriorMean({ counts: [2, 10], mean: [0.75, 0.25] }, 5);
    expect(got[0]).toBeCloseTo(5.75 / 17, 12); // hand computation
    expect(got[1]).toBeCloseTo(11.25 / 17, 12);
  });
});

describe("logBayesFactorAgainstMean", () => {
  // Bayes–Laplace: under a uniform prior on a binomial p, a given sequence with k successes in n
  // trials has marginal probability k!(n−k)!/(n+1)! (Bayes 1763; Laplace 1774).
  const bayesLaplace = (k: number, n: number, p: number) => {
    const logFactorial = (x: number) => Array.from({ length: x }, (_, i) => Math.log(i + 1)).reduce((a, b) => a + b, 0);
    return logFactorial(k) + logFactorial(n - k) - logFactorial(n + 1) - (k * Math.log(p) + (n - k) * Math.log(1 - p));
  };

  it("is the Bayes–Laplace marginal over the binomial at the authored value", () => {
    expect(logBayesFactorAgainstMean({ counts: [7, 3], mean: [0.5, 0.5] })).toBeCloseTo(bayesLaplace(7, 10, 0.5), 12);
    expect(logBayesFactorAgainstMean({ counts: [2, 38], mean: [0.9, 0.1] })).toBeCloseTo(bayesLaplace(2, 40, 0.9), 12);
    // 7 of 10 at p = 0.5: the factor is 1/(11·C(10,7)/2¹⁰) = 0.7758 (hand computation), mildly for "the tree is right".
    expect(Math.exp(logBayesFactorAgainstMean({ counts: [7, 3], mean: [0.5, 0.5] }))).toBeCloseTo(1024 / (11 * 120), 10);
  });

  it("grows with the number of cases behind the same difference", () => {
    const factors = [10, 40, 160].map((n) => logBayesFactorAgainstMean({ counts: [n * 0.5, n * 0.5], mean: [0.75, 0.25] }));
    expect(factors[0]).toBeLessThan(Math.log(20));
    expect(factors[1]).toBeGreaterThan(factors[0]);
    expect(factors[2]).toBeGreaterThan(Math.log(150));
  });
});
