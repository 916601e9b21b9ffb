import { rankingScores, type CalibrationBin, type RankingRow, type RankingScores } from "@/lib/diagnosis";

/**
 * rankingScores over rows that arrive in batches: each batch is scored by lib/diagnosis, and the
 * batch means are recombined weighted by their counts, so the result equals one call over all rows
 * (up to floating-point rounding) without holding every row in memory.
 */
export class ScoreAccumulator {
  private n = 0;
  private top1 = 0;
  private top3 = 0;
  private brier = 0;
  private logLoss = 0;
  private bins: { from: number; to: number; n: number; predicted: number; hits: number }[] = [];

  add(rows: RankingRow[]): void {
    if (rows.length === 0) return;
    this.merge(rankingScores(rows));
  }

  merge(s: RankingScores): void {
    this.n += s.n;
    this.top1 += s.top1 * s.n;
    this.top3 += s.top3 * s.n;
    this.brier += s.brier * s.n;
    this.logLoss += s.logLoss * s.n;
    s.calibration.forEach((b, i) => {
      const acc = (this.bins[i] ??= { from: b.from, to: b.to, n: 0, predicted: 0, hits: 0 });
      acc.n += b.n;
      acc.predicted += b.meanPredicted * b.n;
      acc.hits += b.observed * b.n;
    });
  }

  get count(): number {
    return this.n;
  }

  result(): RankingScores | null {
    if (this.n === 0) return null;
    const n = this.n;
    const calibration: CalibrationBin[] = this.bins.map((b) => ({
      from: b.from, to: b.to, n: b.n, meanPredicted: b.n > 0 ? b.predicted / b.n : 0, observed: b.n > 0 ? b.hits / b.n : 0,
    }));
    return { n, top1: this.top1 / n, top3: this.top3 / n, brier: this.brier / n, logLoss: this.logLoss / n, calibration };
  }
}
