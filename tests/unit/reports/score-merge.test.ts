import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { rankingScores, type RankingRow } from "@/lib/diagnosis";
import { ScoreAccumulator } from "@/lib/reports/score-merge";

const row = fc.record({
  a: fc.double({ min: 0, max: 1, noNaN: true }),
  b: fc.double({ min: 0, max: 1, noNaN: true }),
  c: fc.double({ min: 0, max: 1, noNaN: true }),
  confirmed: fc.constantFrom("a", "b", "c", "unlisted"),
}).map(({ a, b, c, confirmed }): RankingRow => ({ probabilities: { a, b, c }, confirmed }));

describe("scoring rows in batches", () => {
  it("equals one rankingScores call over all rows (property, against the engine itself)", () => {
    fc.assert(fc.property(fc.array(row, { minLength: 1, maxLength: 60 }), fc.integer({ min: 1, max: 7 }), (rows, size) => {
      const acc = new ScoreAccumulator();
      for (let i = 0; i < rows.length; i += size) acc.add(rows.slice(i, i + size));
      const batched = acc.result()!;
      const whole = rankingScores(rows);
      expect(batched.n).toBe(whole.n);
      for (const k of ["top1", "top3", "brier", "logLoss"] as const) expect(batched[k]).toBeCloseTo(whole[k], 9);
      batched.calibration.forEach((b, i) => {
        expect(b.n).toBe(whole.calibration[i].n);
        expect(b.meanPredicted).toBeCloseTo(whole.calibration[i].meanPredicted, 9);
        expect(b.observed).toBeCloseTo(whole.calibration[i].observed, 9);
      });
    }));
  });

  it("has no result before any row", () => {
    expect(new ScoreAccumulator().result()).toBeNull();
  });
});
