import { describe, expect, it } from "vitest";
import { benchProgress } from "@/lib/bench/progress";
import type { BenchCause, BenchInputs, StageInfo } from "@/lib/bench/types";

const stages: StageInfo[] = [
  { slug: "unit", name: "Unit", parent: null, openMinutes: 10, closeMinutes: 5, caution: "none" },
  { slug: "shell", name: "Housing", parent: "unit", openMinutes: 20, closeMinutes: 20, caution: "power" },
];
const cause = (slug: string, stage: string, prior: number, over: Partial<BenchCause> = {}): BenchCause => ({
  id: slug.length, slug, name: slug, stage, inspectMinutes: 10, catalogueMinutes: 15, labourMinutes: 60, prior, parts: [], ...over,
});
const inputs = (over: Partial<BenchInputs> = {}): BenchInputs => ({
  stages,
  causes: [cause("arm", "unit", 0.5), cause("clutch", "shell", 0.3, { parts: [{ id: 7, quantity: 1 }] })],
  unlisted: 0.2,
  findings: [],
  history: [],
  ...over,
});

describe("bench progress", () => {
  it("a not-found counts as strong evidence against, by Bayes' rule", () => {
    const p = benchProgress(inputs({ findings: [{ cause: "arm", result: "not_found", photoId: null }] }));
    // Bayes' theorem with likelihood ratio 1/9 for the inspected cause, worked by hand:
    // weights arm 0.5/9, clutch 0.3, none 0.2; total 5/9 → arm 0.1, clutch 0.54, none 0.36.
    expect(p.ranking.find((r) => r.slug === "arm")!.probability).toBeCloseTo(0.1, 12);
    expect(p.ranking.find((r) => r.slug === "clutch")!.probability).toBeCloseTo(0.54, 12);
    expect(p.unlisted).toBeCloseTo(0.36, 12);
    // Only the clutch is left: the housing opens with it (the unit is already open), 20 + 10 minutes.
    expect(p.checklist).toEqual([expect.objectContaining({ cause: "clutch", minutes: 30, reachProbability: 1 })]);
    expect(p.checklist[0].opens.map((s) => s.slug)).toEqual(["shell"]);
    expect(p.expectedMinutesLeft).toBeCloseTo(30, 12);
  });

  it("labour counts opening and closing each stage once, the inspections and the repair of what was found", () => {
    const p = benchProgress(inputs({ findings: [{ cause: "arm", result: "not_found", photoId: null }, { cause: "clutch", result: "found", photoId: null }] }));
    // By hand: unit 10 + 5, housing 20 + 20, two inspections 10 + 10 = 75; the clutch's repair 60 → 135.
    expect(p.teardownMinutes).toBe(75);
    expect(p.labourEstimate).toBe(135);
    expect(p.found).toEqual(["clutch"]);
    expect(p.proposedParts).toEqual([{ id: 7, quantity: 1 }]);
    expect(p.checklist).toEqual([]);
  });

  it("not done changes nothing and opens nothing", () => {
    const p = benchProgress(inputs({ findings: [{ cause: "clutch", result: "not_done", photoId: null }] }));
    expect(p.openStages).toEqual([]);
    expect(p.ranking.find((r) => r.slug === "clutch")!.probability).toBeCloseTo(0.3, 12);
    expect(p.checklist.map((s) => s.cause)).toEqual(["arm"]);
  });

  it("with no ranking to start from, every located cause starts equal", () => {
    const p = benchProgress(inputs({ causes: [cause("arm", "unit", 0), cause("clutch", "shell", 0)], unlisted: 0 }));
    expect(p.ranking.map((r) => r.probability)).toEqual([0.5, 0.5]);
    expect(p.checklist.map((s) => s.cause)).toEqual(["arm", "clutch"]);
  });

  it("suggests companions only inside open stages, with lift above 1", () => {
    const causes = [cause("arm", "unit", 0.5), cause("clutch", "shell", 0.3), cause("seal", "shell", 0.1), cause("bolt", "unit", 0.05)];
    // 2 of 3 clutch cases also had the seal (base rate 2/6), and 2 the bolt (base rate 4/6: lift 1, not shown).
    const history = [["clutch", "seal", "bolt"], ["clutch", "seal", "bolt"], ["clutch"], ["bolt"], ["bolt"], ["arm"]];
    const closed = benchProgress(inputs({ causes, history }));
    expect(closed.companions).toEqual([]);
    const open = benchProgress(inputs({ causes, history, findings: [{ cause: "clutch", result: "found", photoId: null }] }));
    expect(open.companions.map((c) => c.cause)).toEqual(["seal"]);
    // Lift (Brin, Motwani, Ullman & Tsur 1997) by hand: (2/3) / (2/6) = 2.
    expect(open.companions[0].figures.lift).toBeCloseTo(2, 12);
  });
});
