import { DiagnosisError } from "./errors";
import { requireNonNegative, requirePositive, requireProbability } from "./guards";
import type { CalibrationBin, Interval, RankingRow, RankingRowScore, RankingScores } from "./types";

/** Two-sided 95 % normal quantile, to the precision the interval needs. */
export const Z_95 = 1.959963984540054;
const LOG_LOSS_FLOOR = 1e-6;
export const CALIBRATION_BINS = 10;

/** Wilson score interval for x successes in n trials. */
export function wilsonInterval(successes: number, n: number, z: number = Z_95): Interval {
  requirePositive(n, "n (number of trials)", "bad_count");
  requireNonNegative(successes, "successes", "bad_count");
  requirePositive(z, "z");
  if (successes > n) throw new DiagnosisError("bad_count", `successes (${successes}) exceed trials (${n})`);
  const z2 = z * z;
  const centre = (successes + z2 / 2) / (n + z2);
  const half = (z / (n + z2)) * Math.sqrt((successes * (n - successes)) / n + z2 / 4);
  // At x = 0 and x = n the bounds are exactly 0 and 1; pin them against rounding.
  return {
    low: successes === 0 ? 0 : Math.max(0, centre - half),
    high: successes === n ? 1 : Math.min(1, centre + half),
  };
}

/**
 * 1-based rank of the confirmed category. Ties count against it: a category with the same
 * probability is ranked ahead, so a flat ranking earns no hits. A confirmed category that is
 * absent or has probability 0 was not predicted at all and has no rank (Infinity).
 */
function confirmedRank(row: RankingRow): number {
  const pc = Object.hasOwn(row.probabilities, row.confirmed) ? row.probabilities[row.confirmed] : 0;
  if (pc === 0) return Infinity;
  let rank = 1;
  for (const [key, p] of Object.entries(row.probabilities)) if (key !== row.confirmed && p >= pc) rank++;
  return rank;
}

function checkRows(rows: RankingRow[]): void {
  if (!Array.isArray(rows) || rows.length === 0) throw new DiagnosisError("empty_input", "Ranking scores need at least one row");
  rows.forEach((row, i) => {
    for (const [key, p] of Object.entries(row.probabilities)) requireProbability(p, `row ${i}, probability of ${JSON.stringify(key)}`);
  });
}

/** Share of rows whose confirmed category is among the k most probable. */
export function topKAccuracy(rows: RankingRow[], k: number): number {
  checkRows(rows);
  if (!Number.isInteger(k) || k < 1) throw new DiagnosisError("bad_number", `k must be a whole number ≥ 1, got ${String(k)}`);
  return rows.filter((r) => confirmedRank(r) <= k).length / rows.length;
}

/**
 * How one ranking scored against its confirmed category: the confirmed category's rank (Infinity
 * when not predicted) and probability, the top probability (its calibration bin), the Brier sum and
 * the log loss. rankingScores is the mean of these over rows; a report may store them per row.
 */
export function rankingRowScore(row: RankingRow): RankingRowScore {
  checkRows([row]);
  return scoreOf(row);
}

function scoreOf(row: RankingRow): RankingRowScore {
  const confirmedP = Object.hasOwn(row.probabilities, row.confirmed) ? row.probabilities[row.confirmed] : 0;
  let topP = 0;
  let brier = Object.hasOwn(row.probabilities, row.confirmed) ? 0 : 1;
  for (const [key, p] of Object.entries(row.probabilities)) {
    brier += key === row.confirmed ? (p - 1) ** 2 : p * p;
    if (p > topP) topP = p;
  }
  const logLoss = -Math.log(Math.min(1, Math.max(LOG_LOSS_FLOOR, confirmedP)));
  return { rank: confirmedRank(row), confirmedP, topP, brier, logLoss };
}

/** The calibration bin (0 … CALIBRATION_BINS − 1) of a top probability. */
export function calibrationBin(topP: number): number {
  return Math.min(CALIBRATION_BINS - 1, Math.floor(topP * CALIBRATION_BINS));
}

/**
 * Top-1/top-3 hit rates, Brier's multi-category score (Σ over categories of (p − y)², the
 * confirmed one included at p = 0 when absent; range 0–2), log loss (natural log, p clipped
 * to [1e-6, 1]) and ten equal calibration bins of the top probability, all ten always present
 * (an empty bin has n = 0 and zeros); a hit is a top-1 hit.
 */
export function rankingScores(rows: RankingRow[]): RankingScores {
  checkRows(rows);
  const bins = Array.from({ length: CALIBRATION_BINS }, () => ({ n: 0, predicted: 0, hits: 0 }));
  let top1 = 0;
  let top3 = 0;
  let brier = 0;
  let logLoss = 0;

  for (const row of rows) {
    const score = scoreOf(row);
    if (score.rank === 1) top1++;
    if (score.rank <= 3) top3++;
    brier += score.brier;
    logLoss += score.logLoss;
    const bin = bins[calibrationBin(score.topP)];
    bin.n++;
    bin.predicted += score.topP;
    if (score.rank === 1) bin.hits++;
  }

  const n = rows.length;
  const calibration: CalibrationBin[] = bins.map((b, i) => ({
    from: i / CALIBRATION_BINS,
    to: (i + 1) / CALIBRATION_BINS,
    n: b.n,
    meanPredicted: b.n > 0 ? b.predicted / b.n : 0,
    observed: b.n > 0 ? b.hits / b.n : 0,
  }));
  return { n, top1: top1 / n, top3: top3 / n, brier: brier / n, logLoss: logLoss / n, calibration };
}
