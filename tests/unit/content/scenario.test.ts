import { describe, expect, it } from "vitest";
import { DEFAULT_WEIGHTS } from "@/lib/diagnosis";
import type { TreeFile } from "@/lib/trees/file/schema";
import { content } from "./load";

const sum = (xs: number[]) => xs.reduce((s, x) => s + x, 0);

/** P(option | cause) at the option's node, normalised over the node's answers other than "don't know". */
function likelihood(tree: TreeFile, optionKey: string, cause: string, override?: keyof typeof DEFAULT_WEIGHTS): number {
  const option = tree.options.find((o) => o.key === optionKey);
  if (!option) throw new Error(`${tree.slug}: no option ${optionKey}`);
  const weight = (o: TreeFile["options"][number]) =>
    DEFAULT_WEIGHTS[o.key === optionKey && override ? override : (o.evidence[cause] ?? "neutral")];
  const siblings = tree.options.filter((o) => o.from === option.from && !o.dontKnow);
  return weight(option) / sum(siblings.map(weight));
}

describe("history scenario", () => {
  it("gives every family a case share, a riding-use mix and cause rates, each share summing to 1", () => {
    const { scenario, families } = content();
    expect(Object.keys(scenario.families).sort()).toEqual(families.map((f) => f.slug).sort());
    expect(sum(Object.values(scenario.families).map((f) => f.caseShare))).toBeCloseTo(1, 9);
    for (const [slug, f] of Object.entries(scenario.families)) {
      expect(sum(Object.values(f.ridingUse)), slug).toBeCloseTo(1, 9);
      expect(Object.keys(f.causeRates).length, slug).toBeGreaterThanOrEqual(10);
    }
    expect(sum(Object.values(scenario.symptomShare))).toBeCloseTo(1, 9);
    expect(Object.keys(scenario.symptomShare).sort()).toEqual(content().trees.map((t) => t.slug).sort());
  });

  it("skews each family towards a few dominant causes", () => {
    for (const [slug, f] of Object.entries(content().scenario.families)) {
      const rates = Object.values(f.causeRates).sort((a, b) => b - a);
      expect(sum(rates.slice(0, 3)) / sum(rates), slug).toBeGreaterThan(0.35);
    }
  });

  it("boosts water-related causes in the wet months October to March", () => {
    const { water } = content().scenario;
    expect([...water.wetMonths].sort((a, b) => a - b)).toEqual([1, 2, 3, 10, 11, 12]);
    expect(water.boost).toBeGreaterThan(1);
    expect(water.causes).toEqual(expect.arrayContaining(["needle-bearing-water", "controller-corrosion", "crank-seal-worn"]));
  });

  it("mis-weights 4–6 authored options by a large margin in normalised likelihood", () => {
    const { scenario, trees } = content();
    expect(scenario.misweighted.length).toBeGreaterThanOrEqual(4);
    expect(scenario.misweighted.length).toBeLessThanOrEqual(6);
    for (const m of scenario.misweighted) {
      const tree = trees.find((t) => t.slug === m.tree);
      if (!tree) throw new Error(`no tree ${m.tree}`);
      const authored = likelihood(tree, m.option, m.cause);
      const actual = likelihood(tree, m.option, m.cause, m.actual);
      // Well beyond the 0.25 difference at which DESIGN §4 raises an evidence review suggestion.
      expect(Math.abs(actual - authored), `${m.tree}/${m.option}/${m.cause}`).toBeGreaterThan(0.4);
    }
  });
});
