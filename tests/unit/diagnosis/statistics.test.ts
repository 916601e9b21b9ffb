import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { DiagnosisError, rankingScores, topKAccuracy, wilsonInterval } from "@/lib/diagnosis";

describe("Wilson score interval", () => {
  it("matches Newcombe's Table I", () => {
    const a = wilsonInterval(81, 263);
    expect(a.low).toBeCloseTo(0.2553, 4); // Newcombe, Stat. Med. 17 (1998), Table I: 81/263
    expect(a.high).toBeCloseTo(0.3662, 4); // same table
    const b = wilsonInterval(15, 148);
    expect(b.low).toBeCloseTo(0.0624, 4); // Newcombe 1998, Table I: 15/148
    expect(b.high).toBeCloseTo(0.1605, 4); // same table
  });

  it("edge cases", () => {
    expect(wilsonInterval(0, 20).low).toBe(0); // x = 0 gives a lower bound of exactly 0
    expect(wilsonInterval(20, 20).high).toBe(1); // x = n gives an upper bound of exactly 1
    expect(() => wilsonInterval(0, 0)).toThrow(DiagnosisError); // n = 0 is an error, not NaN
    expect(() => wilsonInterval(5, 4)).toThrow(DiagnosisError); // definition: x cannot exceed n
  });

  it("bounds lie in [0, 1] and contain the point estimate (property)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 100000 }), fc.double({ min: 0, max: 1, noNaN: true }), (n, share) => {
        const x = Math.round(share * n);
        const { low, high } = wilsonInterval(x, n);
        // Definition (Wilson 1927): the score interval lies in [0, 1] and contains x/n.
        expect(low).toBeGreaterThanOrEqual(0);
        expect(high).toBeLessThanOrEqual(1);
        expect(low).toBeLessThanOrEqual(x / n + 1e-12);
        expect(high).toBeGreaterThanOrEqual(x / n - 1e-12);
      }),
    );
  });
});

describe("scores of a probabilistic ranking", () => {
  it("Brier score, multi-category form", () => {
    // y = [0,1,1,0], p(class 1) = [0.1,0.9,0.8,0.3] written as two-class rows.
    const rows = [0.1, 0.9, 0.8, 0.3].map((p1, i) => ({
      probabilities: { c0: 1 - p1, c1: p1 },
      confirmed: [0, 1, 1, 0][i] === 1 ? "c1" : "c0",
    }));
    // Brier, Monthly Weather Review 78 (1950), multi-category form; 0.075 (binary form 0.0375).
    expect(rankingScores(rows).brier).toBeCloseTo(0.075, 12);
  });

  it("a confirmed category absent from the probabilities counts as p = 0", () => {
    const s = rankingScores([{ probabilities: { a: 0.6, b: 0.4 }, confirmed: "unlisted" }]);
    expect(s.brier).toBeCloseTo(0.36 + 0.16 + 1, 12); // Brier 1950 multi-category definition
    expect(s.logLoss).toBeCloseTo(-Math.log(1e-6), 9); // log loss clipped at 1e-6
    expect(s.top3).toBe(0); // our documented rule: an absent or zero-probability category has no rank
  });

  it("log loss", () => {
    const p = [[0.1, 0.9], [0.9, 0.1], [0.8, 0.2], [0.35, 0.65]];
    const y = ["spam", "ham", "ham", "spam"];
    const rows = p.map(([ham, spam], i) => ({ probabilities: { ham, spam }, confirmed: y[i] }));
    expect(rankingScores(rows).logLoss).toBeCloseTo(0.216162, 6); // scikit-learn log_loss documentation
  });

  it("top-k accuracy", () => {
    const scores = [[0.5, 0.2, 0.2], [0.3, 0.4, 0.2], [0.2, 0.4, 0.3], [0.7, 0.2, 0.1]];
    const y = [0, 1, 2, 2];
    const rows = scores.map((s, i) => ({ probabilities: { k0: s[0], k1: s[1], k2: s[2] }, confirmed: `k${y[i]}` }));
    const s = rankingScores(rows);
    expect(s.top1).toBe(0.5); // scikit-learn top_k_accuracy_score documentation, recomputed: k=1
    expect(topKAccuracy(rows, 2)).toBe(0.75); // same source: k=2
    expect(s.top3).toBe(1); // same source: k=3
    expect(s.n).toBe(4);
  });

  it("calibration has ten equal bins of the top probability", () => {
    const rows = [
      { probabilities: { a: 0.95, b: 0.05 }, confirmed: "a" },
      { probabilities: { a: 0.91, b: 0.09 }, confirmed: "b" },
      { probabilities: { a: 0.5, b: 0.5 }, confirmed: "a" },
      { probabilities: { a: 1, b: 0 }, confirmed: "a" },
    ];
    const bins = rankingScores(rows).calibration;
    expect(bins).toHaveLength(10); // ten equal bins
    expect(bins[9]).toEqual({ from: 0.9, to: 1, n: 3, meanPredicted: (0.95 + 0.91 + 1) / 3, observed: 2 / 3 }); // definition: [0.9, 1.0] holds 1.0
    // A tie at the top is not a hit: the ranking did not single out the confirmed cause (our rule, documented).
    expect(bins[5]).toEqual({ from: 0.5, to: 0.6, n: 1, meanPredicted: 0.5, observed: 0 });
    expect(bins[0]).toEqual({ from: 0, to: 0.1, n: 0, meanPredicted: 0, observed: 0 });
  });

  it("refuses empty or invalid input", () => {
    expect(() => rankingScores([])).toThrow(DiagnosisError); // never NaN
    expect(() => rankingScores([{ probabilities: { a: Number.NaN }, confirmed: "a" }])).toThrow(DiagnosisError);
    expect(() => topKAccuracy([{ probabilities: { a: 1 }, confirmed: "a" }], 0)).toThrow(DiagnosisError); // k ≥ 1
  });
});
