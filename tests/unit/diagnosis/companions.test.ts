import { describe, it, expect } from "vitest";
import { companionFigures, DiagnosisError } from "@/lib/diagnosis";

function repeat(n: number, causes: string[]): string[][] {
  return Array.from({ length: n }, () => [...causes]);
}

describe("companion figures", () => {
  it("gives the conditional share, its Wilson interval and the lift", () => {
    // 500 closed cases: 263 confirmed the clutch, 81 of them also the bearing; 44 more the bearing alone.
    const cases = [...repeat(81, ["clutch", "bearing"]), ...repeat(182, ["clutch"]), ...repeat(44, ["bearing"]), ...repeat(193, ["board"])];
    const [bearing] = companionFigures(cases, "clutch");
    expect(bearing.cause).toBe("bearing");
    expect([bearing.together, bearing.givenCases, bearing.causeCases, bearing.cases]).toEqual([81, 263, 125, 500]);
    // Confidence of the rule clutch ⇒ bearing (Agrawal, Imieliński & Swami, SIGMOD 1993): 81/263.
    expect(bearing.share).toBeCloseTo(81 / 263, 12);
    // Newcombe, Statistics in Medicine 17 (1998), Table I, Wilson score interval for 81/263: 0.2553–0.3662.
    expect(bearing.interval.low).toBeCloseTo(0.2553, 4);
    expect(bearing.interval.high).toBeCloseTo(0.3662, 4);
    // Lift (Brin, Motwani, Ullman & Tsur, SIGMOD 1997) = P(B|A)/P(B), by hand: (81/263)/(125/500) = 40500/32875 = 1.231939.
    expect(bearing.baseRate).toBeCloseTo(0.25, 12);
    expect(bearing.lift).toBeCloseTo(1.231939, 6);
  });

  it("lists only causes seen with the given one, by lift", () => {
    const cases = [["a", "b"], ["a", "b"], ["a", "c"], ["b"], ["c"], ["c"], ["d"]];
    const figures = companionFigures(cases, "a");
    // By hand from the definitions above: b 2/3 ÷ 3/7 = 14/9; c 1/3 ÷ 3/7 = 7/9; d never with a.
    expect(figures.map((f) => [f.cause, f.lift])).toEqual([
      ["b", expect.closeTo(14 / 9, 12)],
      ["c", expect.closeTo(7 / 9, 12)],
    ]);
    expect(companionFigures(cases, "never-confirmed")).toEqual([]);
  });

  it("refuses no cases", () => {
    expect(() => companionFigures([], "a")).toThrow(DiagnosisError);
  });
});
