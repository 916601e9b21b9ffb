import { beforeAll, describe, expect, it } from "vitest";
import { treeAccuracy, type VersionAccuracy } from "@/lib/reports/accuracy";
import { parseReportFilter } from "@/lib/reports/period";
import { resolveScope } from "@/lib/reports/scope";
import { resetToDemo } from "../../support/seed";
import { day, demoIds, insertCases, type CaseSpec } from "./fixtures";

const F = "orvanta-tessel-2";
const closedAt = day("2025-05-10");
const closed = (tree: string, primary: string | null, ranking: Record<string, number>): CaseSpec => ({ family: F, tree, closedAt, primary, ranking });

// Version of "pedal-slip": scikit-learn's log_loss example, classes ham (owc-cage-broken) and spam (belt-worn).
const HAM = "owc-cage-broken";
const SPAM = "belt-worn";
const logLossSet = [
  closed("pedal-slip", SPAM, { [HAM]: 0.1, [SPAM]: 0.9, unlisted: 0 }),
  closed("pedal-slip", HAM, { [HAM]: 0.9, [SPAM]: 0.1, unlisted: 0 }),
  closed("pedal-slip", HAM, { [HAM]: 0.8, [SPAM]: 0.2, unlisted: 0 }),
  closed("pedal-slip", SPAM, { [HAM]: 0.35, [SPAM]: 0.65, unlisted: 0 }),
];
// Version of "weak-assist": scikit-learn's top_k_accuracy_score example, classes 0, 1, 2.
const K0 = "torque-sensor-drift";
const K1 = "speed-sensor-gap";
const K2 = "firmware-outdated";
const topKSet = [
  closed("weak-assist", K0, { [K0]: 0.5, [K1]: 0.2, [K2]: 0.2 }),
  closed("weak-assist", K1, { [K0]: 0.3, [K1]: 0.4, [K2]: 0.2 }),
  closed("weak-assist", K2, { [K0]: 0.2, [K1]: 0.4, [K2]: 0.3 }),
  closed("weak-assist", K2, { [K0]: 0.7, [K1]: 0.2, [K2]: 0.1 }),
];
// Version of "grinding-noise": Brier's example y = [0, 1, 1, 0], p(class 1) = [0.1, 0.9, 0.8, 0.3].
const C0 = "needle-bearing-water";
const C1 = "belt-worn";
const brierSet = [
  closed("grinding-noise", C0, { [C0]: 0.9, [C1]: 0.1 }),
  closed("grinding-noise", C1, { [C0]: 0.1, [C1]: 0.9 }),
  closed("grinding-noise", C1, { [C0]: 0.2, [C1]: 0.8 }),
  closed("grinding-noise", C0, { [C0]: 0.7, [C1]: 0.3 }),
];
// Version of "water-cutout": outcomes outside the tree's causes count as the unlisted hypothesis being right.
const unlistedSet = [
  closed("water-cutout", null, { "crank-seal-worn": 0.6, "controller-corrosion": 0.3, unlisted: 0.1 }),
  closed("water-cutout", "owc-cage-broken", { "crank-seal-worn": 0.7, unlisted: 0.3 }),
];
// None of these may be scored: open ones, and closed ones without a triage ranking (as imported records are).
const ignored: CaseSpec[] = [
  { family: F, tree: "grinding-noise", status: "on_bench", createdAt: day("2025-05-01"), primary: C1, ranking: { [C0]: 1, [C1]: 0 } },
  { family: F, tree: "grinding-noise", status: "advised", createdAt: day("2025-05-01"), ranking: { [C0]: 1, [C1]: 0 } },
  { ...closed("grinding-noise", C1, { [C0]: 1, [C1]: 0 }), steps: false, ranking: null },
  { family: F, tree: "grinding-noise", closedAt, primary: C1, ranking: null },
];

describe("tree accuracy per version on hand-built closed cases", () => {
  let byTree: Map<string, VersionAccuracy>;

  beforeAll(async () => {
    await resetToDemo();
    await insertCases(await demoIds(), [...logLossSet, ...topKSet, ...brierSet, ...unlistedSet, ...ignored]);
    const scope = await resolveScope(parseReportFilter({ from: "2025-01-01", to: "2025-12-31" }));
    byTree = new Map((await treeAccuracy(scope)).map((a) => [a.treeSlug, a]));
  });

  it("scores only closed, triaged cases, one row per tree version", () => {
    expect([...byTree.keys()].sort()).toEqual(["grinding-noise", "pedal-slip", "water-cutout", "weak-assist"]);
    expect(byTree.get("grinding-noise")!.scores.n).toBe(4);
    expect(byTree.get("grinding-noise")!.versionNumber).toBe(1);
  });

  it("log loss matches scikit-learn's documented example", () => {
    const s = byTree.get("pedal-slip")!.scores;
    // scikit-learn log_loss documentation: y = [spam, ham, ham, spam], p as above → 0.216162 (natural log).
    expect(s.logLoss).toBeCloseTo(0.216162, 6);
    // Hand computation from the definitions: every confirmed cause is the top one.
    expect(s.top1).toBe(1);
    // Hand computation: Σ (p−y)² per case = 0.02, 0.02, 0.08, 0.245 → mean 0.09125.
    expect(s.brier).toBeCloseTo(0.09125, 12);
    // Hand computation of the calibration table: top probabilities 0.9, 0.9, 0.8, 0.65, all hits.
    const bins = s.calibration.filter((b) => b.n > 0).map((b) => [b.from, b.n, Number(b.meanPredicted.toFixed(10)), b.observed]);
    expect(bins).toEqual([[0.6, 1, 0.65, 1], [0.8, 1, 0.8, 1], [0.9, 2, 0.9, 1]]);
  });

  it("top-1 and top-3 hit rates match scikit-learn's top_k_accuracy_score example", () => {
    const s = byTree.get("weak-assist")!.scores;
    // scikit-learn top_k_accuracy_score documentation (recomputed): k = 1 → 0.5, k = 3 → 1.0.
    expect(s.top1).toBe(0.5);
    expect(s.top3).toBe(1);
    // Hand computation: Σ (p−y)² = 0.33, 0.49, 0.69, 1.34 → 0.7125; −mean ln p = (ln 2 + ln 2.5 + ln(10/3) + ln 10)/4.
    expect(s.brier).toBeCloseTo(0.7125, 12);
    expect(s.logLoss).toBeCloseTo((Math.log(2) + Math.log(2.5) + Math.log(10 / 3) + Math.log(10)) / 4, 12);
  });

  it("the Brier score matches Brier's multi-category form on his example", () => {
    // G. W. Brier (1950): y = [0,1,1,0], p = [0.1,0.9,0.8,0.3] → 0.075 in the form summed over categories.
    expect(byTree.get("grinding-noise")!.scores.brier).toBeCloseTo(0.075, 12);
  });

  it("counts an outcome the tree does not list as a hit for the unlisted hypothesis", () => {
    const s = byTree.get("water-cutout")!.scores;
    // Hand computation: unlisted ranks 3rd (p 0.1) and 2nd (p 0.3): top-1 0, top-3 1;
    // Brier (0.36 + 0.09 + 0.81 + 0.49 + 0.49) / 2 = 1.12; log loss (ln 10 + ln(10/3)) / 2.
    expect(s.n).toBe(2);
    expect(s.top1).toBe(0);
    expect(s.top3).toBe(1);
    expect(s.brier).toBeCloseTo(1.12, 12);
    expect(s.logLoss).toBeCloseTo((Math.log(10) + Math.log(10 / 3)) / 2, 12);
  });
});
