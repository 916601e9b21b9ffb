import { describe, it, expect } from "vitest";
import fc from "fast-check";
import chisquareCdf from "@stdlib/stats-base-dists-chisquare-cdf";
import { DiagnosisError, kaplanMeier, kaplanMeierOfTally, logRank, logRankOfTally, tallyObservations, type SurvivalObservation } from "@/lib/diagnosis";
import { chiSquareSurvival1 } from "@/lib/diagnosis/survival";

const obs = (events: number[], censored: number[]): SurvivalObservation[] => [
  ...events.map((time) => ({ time, event: true })),
  ...censored.map((time) => ({ time, event: false })),
];

// J. M. Bland & D. G. Altman, "Survival probabilities (the Kaplan-Meier method)", BMJ 1998;317:1572:
// months to conception (event) or censoring in 38 subfertile women. Data from memory, consistent
// with the note's table (25 conceived, 13 did not, 38 in all).
const conception = obs(
  [1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 4, 4, 4, 6, 6, 9, 9, 9, 10, 13, 16],
  [2, 3, 4, 7, 7, 8, 8, 9, 9, 9, 11, 24, 24],
);

// E. J. Freireich et al., Blood 21:699 (1963), remission times in weeks, as tabulated by E. A. Gehan,
// Biometrika 52:203 (1965) and used by D. G. Kleinbaum & M. Klein, "Survival Analysis: a self-learning
// text": 6-MP group and placebo group.
const sixMp = obs([6, 6, 6, 7, 10, 13, 16, 22, 23], [6, 9, 10, 11, 17, 19, 20, 25, 32, 32, 34, 35]);
const placebo = obs([1, 1, 2, 2, 3, 4, 4, 5, 5, 8, 8, 8, 8, 11, 11, 12, 12, 15, 17, 22, 23], []);

// J. M. Bland & D. G. Altman, "The logrank test", BMJ 2004;328:1073: weeks to death or censoring
// in 51 adults with recurrent gliomas (A = anaplastic astrocytoma, G = glioblastoma). Data from memory.
const astrocytoma = obs([6, 13, 21, 30, 37, 38, 49, 50, 63, 79, 86, 98, 202, 219], [31, 47, 80, 82, 82, 149]);
const glioblastoma = obs(
  [10, 10, 12, 13, 14, 15, 16, 17, 18, 20, 24, 24, 25, 28, 30, 33, 35, 37, 40, 40, 46, 48, 76, 81, 82, 91, 112, 181],
  [34, 40, 70],
);

/** The product-limit estimate and Greenwood sum written out from their definitions, for brute-force comparison. */
function bruteForce(data: SurvivalObservation[]) {
  const times = [...new Set(data.filter((o) => o.event).map((o) => o.time))].sort((a, b) => a - b);
  let s = 1;
  let g = 0;
  return times.map((t, i) => {
    const n = data.filter((o) => o.time >= t).length;
    const d = data.filter((o) => o.event && o.time === t).length;
    const next = times[i + 1] ?? Infinity;
    const c = data.filter((o) => !o.event && o.time >= t && o.time < next).length;
    s *= (n - d) / n;
    g += d / (n * (n - d));
    return { time: t, atRisk: n, events: d, censored: c, survival: s, greenwood: g };
  });
}

describe("kaplanMeier", () => {
  it("matches Bland & Altman's conception table", () => {
    const steps = kaplanMeier(conception);
    // Bland & Altman, BMJ 1998;317:1572, table of the note: at risk, conceived, censored and the
    // cumulative proportion not yet conceived at each month with a conception (values from memory).
    const expected = [
      [1, 38, 6, 0, 0.842], [2, 32, 5, 1, 0.711], [3, 26, 3, 1, 0.629], [4, 22, 3, 1, 0.543],
      [6, 18, 2, 4, 0.483], [9, 12, 3, 3, 0.362], [10, 6, 1, 1, 0.302], [13, 4, 1, 0, 0.226], [16, 3, 1, 2, 0.151],
    ];
    expect(steps.map((s) => s.time)).toEqual(expected.map((e) => e[0]));
    expected.forEach(([, atRisk, events, censored, survival], i) => {
      expect(steps[i].atRisk).toBe(atRisk); // same source, "number at risk" column
      expect(steps[i].events).toBe(events); // same source, "conceived" column
      // Censorings from this month up to the next month with a conception (the note lists 7, 8 and 11
      // on rows of their own; here they are summed into the preceding conception month).
      expect(steps[i].censored).toBe(censored);
      expect(steps[i].survival).toBeCloseTo(survival, 3); // same source, printed to three decimals
    });
  });

  it("matches the 6-MP group of Freireich et al. with log(−log) intervals", () => {
    const steps = kaplanMeier(sixMp);
    // Kleinbaum & Klein, "Survival Analysis" (the leukaemia remission data), KM table of the 6-MP
    // group, and R's survfit(conf.type = "log-log") on the same data: (time, n, d, S, lower, upper).
    // Values from memory.
    const expected = [
      [6, 21, 3, 0.857, 0.62, 0.952], [7, 17, 1, 0.807, 0.563, 0.923], [10, 15, 1, 0.753, 0.503, 0.889],
      [13, 12, 1, 0.69, 0.432, 0.849], [16, 11, 1, 0.627, 0.368, 0.805], [22, 7, 1, 0.538, 0.268, 0.747],
      [23, 6, 1, 0.448, 0.188, 0.68],
    ];
    expected.forEach(([time, n, d, s, lo, hi], i) => {
      expect(steps[i]).toMatchObject({ time, atRisk: n, events: d });
      expect(steps[i].survival).toBeCloseTo(s, 3); // printed to three decimals
      expect(steps[i].lower).toBeCloseTo(lo, 3); // same
      expect(steps[i].upper).toBeCloseTo(hi, 3); // same
    });
  });

  it("equals the definitions written out, on random data with ties of events and censorings (property)", () => {
    const observation = fc.record({ time: fc.integer({ min: 0, max: 12 }), event: fc.boolean() });
    fc.assert(
      fc.property(fc.array(observation, { minLength: 1, maxLength: 40 }), (data) => {
        const steps = kaplanMeier(data);
        const brute = bruteForce(data);
        expect(steps.length).toBe(brute.length);
        brute.forEach((b, i) => {
          expect(steps[i]).toMatchObject({ time: b.time, atRisk: b.atRisk, events: b.events, censored: b.censored });
          expect(steps[i].survival).toBeCloseTo(b.survival, 12);
          // Kalbfleisch & Prentice (1980) log(−log) interval: S^exp(±1.96·sqrt(G)/|log S|).
          if (b.survival > 0 && b.survival < 1) {
            const se = Math.sqrt(b.greenwood) / Math.abs(Math.log(b.survival));
            expect(steps[i].lower).toBeCloseTo(b.survival ** Math.exp(1.959963984540054 * se), 12);
            expect(steps[i].upper).toBeCloseTo(b.survival ** Math.exp(-1.959963984540054 * se), 12);
          }
          expect(steps[i].lower).toBeLessThanOrEqual(steps[i].survival + 1e-12);
          expect(steps[i].upper).toBeGreaterThanOrEqual(steps[i].survival - 1e-12);
        });
      }),
    );
  });

  it("counts a censoring at an event time as at risk at that time", () => {
    // Definition of the product-limit estimator (Kaplan & Meier, JASA 53, 1958): deaths are taken to
    // precede censorings at the same time. 4 subjects, event and censoring at 2: S(2) = 1 − 1/4.
    const steps = kaplanMeier(obs([2, 5], [2, 3]));
    expect(steps[0]).toMatchObject({ time: 2, atRisk: 4, events: 1, censored: 2 });
    expect(steps[0].survival).toBeCloseTo(0.75, 12);
    expect(steps[1]).toMatchObject({ time: 5, atRisk: 1, events: 1, censored: 0, survival: 0, lower: 0, upper: 0 });
  });

  it("has no steps when everyone is censored or nobody is observed", () => {
    expect(kaplanMeier(obs([], [1, 2, 3]))).toEqual([]); // definition: S stays 1 without events
    expect(kaplanMeier([])).toEqual([]);
  });

  it("handles a single subject", () => {
    // Definition: one subject with an event at 4 → S drops from 1 to 0; the interval is degenerate.
    expect(kaplanMeier(obs([4], []))).toEqual([{ time: 4, atRisk: 1, events: 1, censored: 0, survival: 0, lower: 0, upper: 0 }]);
    expect(kaplanMeier(obs([], [4]))).toEqual([]);
  });

  it("refuses bad input", () => {
    expect(() => kaplanMeier([{ time: -1, event: true }])).toThrow(DiagnosisError);
    expect(() => kaplanMeier([{ time: Number.NaN, event: false }])).toThrow(DiagnosisError);
    expect(() => kaplanMeier([{ time: 1, event: "yes" as unknown as boolean }])).toThrow(DiagnosisError);
  });
});

describe("logRank", () => {
  it("matches Bland & Altman's glioma example", () => {
    const r = logRank(astrocytoma, glioblastoma);
    // Bland & Altman, BMJ 2004;328:1073: observed 14 and 28 deaths, expected 22.48 and 19.52 (values from memory).
    expect(r.observedA).toBe(14);
    expect(r.observedB).toBe(28);
    expect(r.expectedA).toBeCloseTo(22.48, 2);
    expect(r.expectedB).toBeCloseTo(19.52, 2);
    // The note's chi-square is the approximate Σ(O − E)²/E = 6.88 with P < 0.01; the hypergeometric
    // variance gives a larger statistic (the approximation is conservative, Peto & Peto 1972).
    const approx = (r.observedA - r.expectedA) ** 2 / r.expectedA + (r.observedB - r.expectedB) ** 2 / r.expectedB;
    expect(approx).toBeCloseTo(6.88, 2);
    expect(r.chiSquare).toBeGreaterThan(approx);
    expect(r.pValue).toBeLessThan(0.01);
  });

  it("matches R's survdiff on the Freireich leukaemia data", () => {
    const r = logRank(sixMp, placebo);
    // R survival::survdiff(Surv(time, status) ~ group) on the Gehan/Freireich data: O 9 and 21,
    // E 19.25 and 10.75, Chisq = 16.8 on 1 df, p = 4e-05 (from memory; also printed in Kleinbaum & Klein, ch. 2).
    expect(r.observedA).toBe(9);
    expect(r.observedB).toBe(21);
    expect(r.expectedA).toBeCloseTo(19.25, 2);
    expect(r.expectedB).toBeCloseTo(10.75, 2);
    expect(r.chiSquare).toBeCloseTo(16.79, 2);
    expect(r.pValue).toBeCloseTo(4.17e-5, 6);
  });

  it("gives p from the chi-square distribution as @stdlib computes it", () => {
    const r = logRank(astrocytoma, glioblastoma);
    // @stdlib/stats-base-dists-chisquare-cdf, one degree of freedom.
    expect(r.pValue).toBeCloseTo(1 - chisquareCdf(r.chiSquare, 1), 12);
    for (const x of [1e-6, 0.01, 0.455, 1, 2.5, 3.841458820694124, 6.635, 10, 20, 40]) {
      expect(chiSquareSurvival1(x)).toBeCloseTo(1 - chisquareCdf(x, 1), 12);
    }
    // Standard table value (e.g. Fisher & Yates): the 5 % point of chi-square with 1 df is 3.841.
    expect(chiSquareSurvival1(3.841458820694124)).toBeCloseTo(0.05, 10);
  });

  it("is symmetric in its groups and tells nothing from identical groups", () => {
    const ab = logRank(sixMp, placebo);
    const ba = logRank(placebo, sixMp);
    // Definition: swapping the groups swaps O and E and leaves the statistic unchanged.
    expect(ba.chiSquare).toBeCloseTo(ab.chiSquare, 12);
    expect(ba.expectedA).toBeCloseTo(ab.expectedB, 12);
    const same = logRank(sixMp, sixMp);
    expect(same.chiSquare).toBeCloseTo(0, 12); // identical groups: O = E at every time
    expect(same.pValue).toBeCloseTo(1, 12);
  });

  it("has nothing to test without events, and survives a single subject per group", () => {
    expect(logRank(obs([], [1, 2]), obs([], [3]))).toEqual({ chiSquare: 0, pValue: 1, observedA: 0, expectedA: 0, observedB: 0, expectedB: 0 });
    // One subject each, events at 1 and 2: at t=1 n=2, d=1, E_A=1/2, V=1/4; at t=2 only B is at risk (V=0).
    // (O_A − E_A)²/V = (1 − 1/2)² / (1/4) = 1 (definition written out).
    const r = logRank(obs([1], []), obs([2], []));
    expect(r.expectedA).toBeCloseTo(0.5, 12);
    expect(r.chiSquare).toBeCloseTo(1, 12);
    expect(logRank([], obs([2], [])).chiSquare).toBe(0);
  });

  it("equals the definitions written out on random data with ties (property)", () => {
    const observation = fc.record({ time: fc.integer({ min: 0, max: 10 }), event: fc.boolean() });
    fc.assert(
      fc.property(fc.array(observation, { maxLength: 25 }), fc.array(observation, { maxLength: 25 }), (a, b) => {
        const r = logRank(a, b);
        const times = [...new Set([...a, ...b].filter((o) => o.event).map((o) => o.time))];
        let e = 0;
        let v = 0;
        for (const t of times) {
          const nA = a.filter((o) => o.time >= t).length;
          const nB = b.filter((o) => o.time >= t).length;
          const d = [...a, ...b].filter((o) => o.event && o.time === t).length;
          const n = nA + nB;
          e += (d * nA) / n;
          if (n > 1) v += (d * nA * nB * (n - d)) / (n * n * (n - 1));
        }
        const oA = a.filter((o) => o.event).length;
        expect(r.expectedA).toBeCloseTo(e, 10);
        expect(r.chiSquare).toBeCloseTo(v > 0 ? (oA - e) ** 2 / v : 0, 8);
        expect(r.pValue).toBeGreaterThanOrEqual(0);
        expect(r.pValue).toBeLessThanOrEqual(1);
      }),
    );
  });
});

describe("counted observations", () => {
  it("give the same curve and test as the observations one by one (property)", () => {
    const observation = fc.record({ time: fc.integer({ min: 0, max: 15 }), event: fc.boolean() });
    fc.assert(
      fc.property(fc.array(observation, { maxLength: 40 }), fc.array(observation, { maxLength: 40 }), (a, b) => {
        // Splitting a time's counts over several rows must not change anything either.
        const split = (rows: ReturnType<typeof tallyObservations>) => rows.flatMap((r) => [{ ...r, events: 0 }, { ...r, censored: 0 }]);
        expect(kaplanMeierOfTally(split(tallyObservations(a)))).toEqual(kaplanMeier(a));
        expect(logRankOfTally(split(tallyObservations(a)), tallyObservations(b))).toEqual(logRank(a, b));
      }),
    );
  });

  it("refuses counts that are not whole numbers", () => {
    expect(() => kaplanMeierOfTally([{ time: 1, events: 0.5, censored: 0 }])).toThrow(DiagnosisError);
    expect(() => logRankOfTally([{ time: 1, events: 1, censored: -1 }], [])).toThrow(DiagnosisError);
  });
});
