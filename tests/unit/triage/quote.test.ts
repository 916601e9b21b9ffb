import { describe, expect, it } from "vitest";
import { money } from "@/lib/format";
import { benchPlanFor, roughQuote, type QuoteCause } from "@/lib/triage/quote";

// Made-up catalogue rows for the arithmetic; not demo data.
const cause = (slug: string, low: number, high: number, labour: number, inspect: number): QuoteCause =>
  ({ slug, name: slug.toUpperCase(), priceLowCents: low, priceHighCents: high, labourMinutes: labour, inspectMinutes: inspect });
const catalogue = new Map([
  cause("a", 10000, 20000, 60, 30), cause("b", 30000, 40000, 120, 10), cause("c", 5000, 9000, 20, 5),
].map((c) => [c.slug, c]));
const ranked = (ps: Record<string, number>) => ({ causes: Object.entries(ps).map(([causeId, probability]) => ({ causeId, probability, ruledOutBy: null })) });

describe("rough quote (the shop's rule, recomputed here from its definition)", () => {
  it("weights the price bands of the causes at 10 % or more by their renormalised probability, rounded out to €5", () => {
    const q = roughQuote(ranked({ a: 0.6, b: 0.3, c: 0.05 }), catalogue)!;
    // c is below 10 %: weights a 0.6/0.9 = 2/3, b 1/3.
    // low  = 2/3·100 + 1/3·300 = 166.67 € → floor to €5 = €165
    // high = 2/3·200 + 1/3·400 = 266.67 € → ceil to €5 = €270
    // labour = 2/3·60 + 1/3·120 = 80 min
    expect(q.lowCents).toBe(16500);
    expect(q.highCents).toBe(27000);
    expect(q.labourMinutes).toBe(80);
    expect(q.basis.map((b) => b.slug)).toEqual(["a", "b"]);
    expect(q.basis[0].weight).toBeCloseTo(2 / 3, 12);
  });

  it("falls back to the single most likely cause when none reaches 10 %", () => {
    const q = roughQuote(ranked({ a: 0.05, b: 0.08, c: 0.02 }), catalogue)!;
    expect([q.lowCents, q.highCents, q.labourMinutes]).toEqual([30000, 40000, 120]);
  });

  it("has nothing to quote when every listed cause is ruled out", () => {
    expect(roughQuote(ranked({ a: 0, b: 0 }), catalogue)).toBeNull();
  });

  it("formats euros without needless cents", () => {
    expect(money(16500)).toBe("€165");
    expect(money(1250)).toBe("€12.50");
  });
});

function permutations<T>(items: T[]): T[][] {
  if (items.length <= 1) return [items];
  return items.flatMap((x, i) => permutations([...items.slice(0, i), ...items.slice(i + 1)]).map((rest) => [x, ...rest]));
}

describe("bench plan over the candidate causes", () => {
  it("orders by p / inspection minutes, which no other order beats (Kadane & Simon 1977; Heckerman, Breese & Rommelse 1995)", () => {
    const ps = { a: 0.5, b: 0.3, c: 0.15 };
    const plan = benchPlanFor(ranked(ps), catalogue);
    expect(plan.order).toEqual(["c", "b", "a"]); // 0.03 at 5 min, 0.03 at 10 min (cheaper first on a tie), 0.0167 per minute
    // Expected minutes Σ c_i·(1 − Σ_{j<i} p_j), brute force over every order (CHECKS.md, inspection order).
    const cost = (order: string[]) => {
      let found = 0;
      return order.reduce((sum, id) => { const m = catalogue.get(id)!.inspectMinutes * (1 - found); found += ps[id as keyof typeof ps]; return sum + m; }, 0);
    };
    const best = Math.min(...permutations(["a", "b", "c"]).map(cost));
    expect(plan.expectedMinutes).toBeCloseTo(best, 12);
    expect(plan.expectedMinutes).toBeCloseTo(5 + 10 * 0.85 + 30 * 0.55, 12);
  });

  it("leaves ruled-out causes and causes missing from the catalogue out", () => {
    expect(benchPlanFor(ranked({ a: 0.7, b: 0, zz: 0.2 }), catalogue).order).toEqual(["a"]);
  });
});
