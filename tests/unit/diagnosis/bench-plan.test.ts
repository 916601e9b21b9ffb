import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { benchPlan, DiagnosisError, type BenchItem } from "@/lib/diagnosis";

/** Σ c_i·(1 − Σ_{j<i} p_j), the expected cost in Heckerman, Breese & Rommelse (CACM 38(3), 1995). */
function costOf(order: BenchItem[]): number {
  let found = 0;
  let total = 0;
  for (const item of order) {
    total += item.costMinutes * (1 - found);
    found += item.probability;
  }
  return total;
}

function permutations<T>(items: T[]): T[][] {
  if (items.length <= 1) return [items];
  return items.flatMap((item, i) => permutations([...items.slice(0, i), ...items.slice(i + 1)]).map((rest) => [item, ...rest]));
}

const itemsArb = fc
  .record({
    weights: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 1, maxLength: 7 }),
    costs: fc.array(fc.double({ min: 0.5, max: 90, noNaN: true }), { minLength: 7, maxLength: 7 }),
    total: fc.double({ min: 0.05, max: 1, noNaN: true }),
  })
  .map(({ weights, costs, total }) => {
    const sum = weights.reduce((s, w) => s + w, 0) || 1;
    return weights.map((w, i) => ({ id: `inspect-${i}`, probability: (w / sum) * total * (1 - 1e-12), costMinutes: costs[i] }));
  });

describe("bench plan", () => {
  it("orders by p/c and reports the expected minutes", () => {
    const plan = benchPlan([
      { id: "belt", probability: 0.2, costMinutes: 10 },
      { id: "clutch", probability: 0.5, costMinutes: 20 },
      { id: "board", probability: 0.25, costMinutes: 5 },
    ]);
    // Kadane & Simon (1977): decreasing p/c — board 0.05, clutch 0.025, belt 0.02.
    expect(plan.order).toEqual(["board", "clutch", "belt"]);
    // Heckerman et al. 1995 expected cost: 5 + 20·0.75 + 10·0.25 = 22.5 (probabilities used as given).
    expect(plan.expectedMinutes).toBeCloseTo(22.5, 12);
  });

  it("breaks ties by lower cost, then id", () => {
    const plan = benchPlan([
      { id: "b", probability: 0.2, costMinutes: 20 },
      { id: "z", probability: 0.1, costMinutes: 10 },
      { id: "a", probability: 0.1, costMinutes: 10 },
    ]);
    expect(plan.order).toEqual(["a", "z", "b"]); // our documented tie rule; equal p/c leaves the cost unchanged
  });

  it("equals the best order found by brute force (property, up to 7 items)", () => {
    fc.assert(
      fc.property(itemsArb, (items) => {
        const plan = benchPlan(items);
        const best = Math.min(...permutations(items).map(costOf));
        const byId = new Map(items.map((i) => [i.id, i]));
        // Kadane & Simon 1977; Heckerman, Breese & Rommelse 1995: p/c order minimises the expected cost.
        expect(plan.expectedMinutes).toBeCloseTo(best, 9);
        expect(costOf(plan.order.map((id) => byId.get(id) as BenchItem))).toBeCloseTo(plan.expectedMinutes, 9);
      }),
      { numRuns: 60 },
    );
  });

  it("refuses bad input", () => {
    expect(() => benchPlan([{ id: "a", probability: 0.7, costMinutes: 1 }, { id: "b", probability: 0.7, costMinutes: 1 }])).toThrow(DiagnosisError); // probabilities > 1 in total
    expect(() => benchPlan([{ id: "a", probability: 0.5, costMinutes: 0 }])).toThrow(DiagnosisError); // cost must be > 0
    expect(() => benchPlan([{ id: "a", probability: Number.NaN, costMinutes: 3 }])).toThrow(DiagnosisError); // NaN throws
    expect(benchPlan([])).toEqual({ order: [], expectedMinutes: 0 }); // definition: nothing to inspect costs nothing
  });
});
