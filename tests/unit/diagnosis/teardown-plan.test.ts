import { describe, it, expect } from "vitest";
import fc from "fast-check";
import {
  benchPlan,
  DiagnosisError,
  teardownPlan,
  teardownPlanInOrder,
  teardownPlanner,
  type Assembly,
  type BenchInspection,
} from "@/lib/diagnosis";

function permutations<T>(items: T[]): T[][] {
  if (items.length <= 1) return [items];
  return items.flatMap((item, i) => permutations([...items.slice(0, i), ...items.slice(i + 1)]).map((rest) => [item, ...rest]));
}

/**
 * Expected minutes of inspecting in `order`, each assembly opened when first needed and left
 * open, written out from the definition: Σ over steps of P(reached) × (inspection + newly opened).
 */
function costOf(order: BenchInspection[], assemblies: Assembly[]): number {
  const byId = new Map(assemblies.map((a) => [a.id, a]));
  const open = new Set<string>();
  let found = 0;
  let total = 0;
  for (const x of order) {
    let minutes = x.minutes;
    for (let id: string | null = x.assemblyId; id !== null && !open.has(id); id = byId.get(id)!.parent) {
      open.add(id);
      minutes += byId.get(id)!.openMinutes;
    }
    total += (1 - found) * minutes;
    found += x.probability;
  }
  return total;
}

function codeOf(fn: () => unknown): string {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(DiagnosisError);
    expect((e as DiagnosisError).message.length).toBeGreaterThan(10);
    return (e as DiagnosisError).code;
  }
  throw new Error("expected a DiagnosisError");
}

/**
 * A random tree of up to 5 assemblies (each parent drawn among the earlier ones) and up to 7
 * inspections. Whole numbers scaled down, because fast-check's doubles crowd near 0 and would
 * make every order cost about the same.
 */
const instanceArb = fc
  .record({
    parents: fc.array(fc.nat({ max: 20 }), { minLength: 0, maxLength: 4 }),
    opens: fc.array(fc.integer({ min: 0, max: 40 }), { minLength: 5, maxLength: 5 }),
    inspections: fc.array(
      fc.record({ weight: fc.integer({ min: 0, max: 100 }), minutes: fc.integer({ min: 0, max: 30 }), where: fc.nat({ max: 20 }) }),
      { minLength: 1, maxLength: 7 },
    ),
    totalPercent: fc.integer({ min: 0, max: 100 }),
  })
  .map(({ parents, opens, inspections, totalPercent }) => {
    const assemblies: Assembly[] = [{ id: "unit", parent: null, openMinutes: opens[0] }];
    parents.forEach((p, i) => assemblies.push({ id: `a${i + 1}`, parent: assemblies[p % assemblies.length].id, openMinutes: opens[i + 1] }));
    const sum = inspections.reduce((s, x) => s + x.weight, 0) || 1;
    const list: BenchInspection[] = inspections.map((x, i) => ({
      causeId: `cause-${i}`,
      assemblyId: assemblies[x.where % assemblies.length].id,
      minutes: x.minutes,
      probability: (x.weight / sum) * (totalPercent / 100) * (1 - 1e-12),
    }));
    return { assemblies, inspections: list };
  });

describe("teardown plan", () => {
  it("pays for an assembly once and looks inside it while it is open", () => {
    const assemblies: Assembly[] = [
      { id: "unit", parent: null, openMinutes: 0 },
      { id: "housing", parent: "unit", openMinutes: 10 },
    ];
    const inspections: BenchInspection[] = [
      { causeId: "cable", assemblyId: "unit", minutes: 5, probability: 0.2 },
      { causeId: "clutch", assemblyId: "housing", minutes: 5, probability: 0.5 },
      { causeId: "bearing", assemblyId: "housing", minutes: 5, probability: 0.2 },
    ];
    const plan = teardownPlan(assemblies, inspections);
    // Ottosen & Jensen (UAI 2010), bottom-up P-over-C, worked by hand: the housing's opening
    // absorbs clutch (0.5/15 = 0.033) and then bearing (0.2/5 = 0.04 > 0.033): 0.7/20 = 0.035;
    // cable alone is 0.2/5 = 0.04, so it goes first.
    expect(plan.order).toEqual(["cable", "clutch", "bearing"]);
    // Definition (Heckerman, Breese & Rommelse 1995): 1·5 + 0.8·(10 + 5) + 0.3·5 = 18.5.
    expect(plan.expectedMinutes).toBeCloseTo(18.5, 12);
    expect(plan.steps).toEqual([
      { causeId: "cable", opens: ["unit"], minutes: 5, reachProbability: 1 },
      { causeId: "clutch", opens: ["housing"], minutes: 15, reachProbability: expect.closeTo(0.8, 12) },
      { causeId: "bearing", opens: [], minutes: 5, reachProbability: expect.closeTo(0.3, 12) },
    ]);
    // Brute force over all 6 orders: 18.5 is the least.
    const best = Math.min(...permutations(inspections).map((o) => costOf(o, assemblies)));
    expect(plan.expectedMinutes).toBeCloseTo(best, 12);
  });

  it("is Kadane & Simon's p/c order when everything is in the root", () => {
    const inspections: BenchInspection[] = [
      { causeId: "belt", assemblyId: "unit", minutes: 10, probability: 0.2 },
      { causeId: "clutch", assemblyId: "unit", minutes: 20, probability: 0.5 },
      { causeId: "board", assemblyId: "unit", minutes: 5, probability: 0.25 },
    ];
    const plan = teardownPlan([{ id: "unit", parent: null, openMinutes: 0 }], inspections);
    // Kadane & Simon (1977): decreasing p/c — board 0.05, clutch 0.025, belt 0.02.
    expect(plan.order).toEqual(["board", "clutch", "belt"]);
    // Heckerman et al. 1995 expected cost: 5 + 20·0.75 + 10·0.25 = 22.5.
    expect(plan.expectedMinutes).toBeCloseTo(22.5, 12);
    // The root's own opening is paid by the first step, which is always reached: 22.5 + 4.
    expect(teardownPlan([{ id: "unit", parent: null, openMinutes: 4 }], inspections).expectedMinutes).toBeCloseTo(26.5, 12);
  });

  it("equals benchPlan on flat instances (property)", () => {
    fc.assert(
      fc.property(instanceArb, ({ inspections }) => {
        const flat = inspections.map((x) => ({ ...x, assemblyId: "unit", minutes: x.minutes + 0.5 }));
        const plan = teardownPlan([{ id: "unit", parent: null, openMinutes: 0 }], flat);
        const reference = benchPlan(flat.map((x) => ({ id: x.causeId, probability: x.probability, costMinutes: x.minutes })));
        // Kadane & Simon 1977: both are the p/c order; equal p/c may swap without changing the cost.
        expect(plan.expectedMinutes).toBeCloseTo(reference.expectedMinutes, 9);
      }),
      { numRuns: 60 },
    );
  });

  it("equals the best order found by brute force on nested assemblies (property, up to 7 inspections)", () => {
    fc.assert(
      fc.property(instanceArb, ({ assemblies, inspections }) => {
        const plan = teardownPlan(assemblies, inspections);
        // Ottosen & Jensen (UAI 2010): bottom-up P-over-C is optimal when assemblies need not be
        // closed to see whether the fault was found; opening lazily is never worse, so the best
        // of all inspection orders is the optimum.
        const best = Math.min(...permutations(inspections).map((o) => costOf(o, assemblies)));
        expect(plan.expectedMinutes).toBeCloseTo(best, 9);
        const byCause = new Map(inspections.map((x) => [x.causeId, x]));
        expect(costOf(plan.order.map((id) => byCause.get(id)!), assemblies)).toBeCloseTo(plan.expectedMinutes, 9);
        expect(plan.steps.map((s) => s.causeId)).toEqual(plan.order);
        expect(new Set(plan.steps.flatMap((s) => s.opens)).size).toBe(plan.steps.flatMap((s) => s.opens).length); // opened once
        expect(plan.steps.reduce((s, step) => s + step.reachProbability * step.minutes, 0)).toBeCloseTo(plan.expectedMinutes, 9);
      }),
      { numRuns: 200 },
    );
  });

  it("is not held up by an empty assembly or a free inspection with no chance (a case brute force found)", () => {
    const assemblies: Assembly[] = [
      { id: "unit", parent: null, openMinutes: 0 },
      { id: "a1", parent: "unit", openMinutes: 1 },
      { id: "a4", parent: "a1", openMinutes: 0 }, // nothing to inspect inside
    ];
    const inspections: BenchInspection[] = [
      { causeId: "c0", assemblyId: "unit", minutes: 1, probability: 1 / 300 },
      { causeId: "c1", assemblyId: "a1", minutes: 0, probability: 2 / 300 },
      { causeId: "c2", assemblyId: "unit", minutes: 0, probability: 0 },
    ];
    const plan = teardownPlan(assemblies, inspections);
    const best = Math.min(...permutations(inspections).map((o) => costOf(o, assemblies)));
    // Opening a1 (1 minute) finds c1 with 2/300, twice the efficiency of c0's 1/300 a minute:
    // 1 + (1 − 2/300) · 1 = 1.99333…, where c0 first costs 1.99667.
    expect(plan.expectedMinutes).toBeCloseTo(best, 12);
    expect(plan.expectedMinutes).toBeCloseTo(1 + (1 - 2 / 300), 12);
    expect(plan.order.indexOf("c1")).toBeLessThan(plan.order.indexOf("c0"));
  });

  it("costs a given order with teardownPlanInOrder", () => {
    const assemblies: Assembly[] = [
      { id: "unit", parent: null, openMinutes: 0 },
      { id: "housing", parent: "unit", openMinutes: 10 },
    ];
    const inspections: BenchInspection[] = [
      { causeId: "cable", assemblyId: "unit", minutes: 5, probability: 0.2 },
      { causeId: "clutch", assemblyId: "housing", minutes: 5, probability: 0.5 },
    ];
    // Definition: 1·15 + 0.5·5 = 17.5.
    expect(teardownPlanInOrder(assemblies, inspections, ["clutch", "cable"]).expectedMinutes).toBeCloseTo(17.5, 12);
    expect(codeOf(() => teardownPlanInOrder(assemblies, inspections, ["clutch"]))).toBe("bad_number");
  });

  it("returns an empty plan when there is nothing to inspect", () => {
    expect(teardownPlan([{ id: "unit", parent: null, openMinutes: 3 }], [])).toEqual({ order: [], expectedMinutes: 0, steps: [] });
  });

  it("refuses bad input with the engine's error", () => {
    const root: Assembly = { id: "unit", parent: null, openMinutes: 0 };
    const x = (over: Partial<BenchInspection> = {}): BenchInspection => ({ causeId: "c", assemblyId: "unit", minutes: 5, probability: 0.5, ...over });
    expect(codeOf(() => teardownPlan([], [x()]))).toBe("no_root");
    expect(codeOf(() => teardownPlan([{ id: "a", parent: "b", openMinutes: 1 }, { id: "b", parent: "a", openMinutes: 1 }], [x()]))).toBe("no_root");
    expect(codeOf(() => teardownPlan([root, { id: "other", parent: null, openMinutes: 1 }], [x()]))).toBe("several_roots");
    expect(codeOf(() => teardownPlan([root, { id: "housing", parent: "lid", openMinutes: 1 }], [x()]))).toBe("unknown_assembly");
    expect(
      codeOf(() => teardownPlan([root, { id: "a", parent: "b", openMinutes: 1 }, { id: "b", parent: "a", openMinutes: 1 }], [x()])),
    ).toBe("cycle");
    expect(codeOf(() => teardownPlan([root, { id: "a", parent: "a", openMinutes: 1 }], [x()]))).toBe("cycle");
    expect(codeOf(() => teardownPlan([root, root], [x()]))).toBe("duplicate_id");
    expect(codeOf(() => teardownPlan([root], [x({ assemblyId: "crank" })]))).toBe("unknown_assembly");
    expect(codeOf(() => teardownPlan([root], [x({ minutes: -1 })]))).toBe("bad_cost");
    expect(codeOf(() => teardownPlan([{ ...root, openMinutes: -2 }], [x()]))).toBe("bad_cost");
    expect(codeOf(() => teardownPlan([{ ...root, openMinutes: Number.NaN }], [x()]))).toBe("bad_cost");
    expect(codeOf(() => teardownPlan([root], [x({ probability: -0.1 })]))).toBe("bad_probability");
    expect(codeOf(() => teardownPlan([root], [x({ probability: Number.NaN })]))).toBe("bad_probability");
    expect(codeOf(() => teardownPlan([root], [x({ probability: 0.6 }), x({ causeId: "d", probability: 0.6 })]))).toBe("bad_probability");
    expect(codeOf(() => teardownPlan([root], [x(), x()]))).toBe("duplicate_id");
  });

  it("plans many units of one family with teardownPlanner, as teardownPlan would each", () => {
    fc.assert(
      fc.property(instanceArb, instanceArb, ({ assemblies, inspections }, other) => {
        const plan = teardownPlanner(assemblies);
        expect(plan(inspections)).toEqual(teardownPlan(assemblies, inspections));
        // A second unit's inspections in the same assemblies, all in the root so they always fit.
        const rooted = other.inspections.map((x) => ({ ...x, assemblyId: assemblies.find((a) => a.parent === null)!.id }));
        expect(plan(rooted)).toEqual(teardownPlan(assemblies, rooted));
      }),
      { numRuns: 60 },
    );
  });

  it("checks a planner's assemblies once, when it is made, and keeps them as they were", () => {
    const assemblies: Assembly[] = [
      { id: "unit", parent: null, openMinutes: 0 },
      { id: "housing", parent: "unit", openMinutes: 10 },
    ];
    const plan = teardownPlanner(assemblies);
    assemblies[1].openMinutes = 1000;
    const inspections: BenchInspection[] = [{ causeId: "clutch", assemblyId: "housing", minutes: 5, probability: 0.5 }];
    expect(plan(inspections).expectedMinutes).toBeCloseTo(15, 12);
    expect(codeOf(() => teardownPlanner([{ id: "a", parent: "a", openMinutes: 1 }]))).toBe("no_root");
    expect(codeOf(() => plan([{ causeId: "clutch", assemblyId: "crank", minutes: 5, probability: 0.5 }]))).toBe("unknown_assembly");
  });

  it("names the offending inspection in its error message", () => {
    const root: Assembly = { id: "unit", parent: null, openMinutes: 0 };
    expect(() => teardownPlan([root], [{ causeId: "clutch", assemblyId: "unit", minutes: -1, probability: 0.5 }]))
      .toThrow('minutes of the inspection of "clutch" must be a finite number ≥ 0, got -1');
    expect(() => teardownPlan([{ ...root, openMinutes: -2 }], []))
      .toThrow('openMinutes of assembly "unit" must be a finite number ≥ 0, got -2');
  });
});
