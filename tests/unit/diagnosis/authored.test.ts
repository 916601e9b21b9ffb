import { describe, expect, it } from "vitest";
import { authoredLikelihoods, normaliseWeights, scoreCauses } from "@/lib/diagnosis";
import { answer, buildTree, question } from "./fixtures";

const tree = buildTree({
  causes: { a: 1, b: 1, c: 1 },
  nodes: [
    question("q", [
      { id: "yes", evidence: { a: "strong", b: "rules_out", c: "rules_out" } },
      { id: "no", evidence: { a: "against", c: "rules_out" } },
      { id: "maybe" },
      { id: "unsure", dontKnow: true },
    ]),
  ],
});

describe("normaliseWeights: P(o|k) = λ(o,k) / Σ λ (the engine's definition)", () => {
  it("normalises, and makes a column of zeros uniform", () => {
    expect(normaliseWeights([9, 1 / 3, 1])).toEqual([9 / (31 / 3), 1 / 31, 3 / 31]); // hand computation
    expect(normaliseWeights([0, 0])).toEqual([0.5, 0.5]);
  });
});

describe("authoredLikelihoods", () => {
  it("gives every outcome for every cause, without 'don't know'", () => {
    const table = authoredLikelihoods(tree);
    expect(Object.keys(table).sort()).toEqual(["maybe", "no", "yes"]);
    // a: strong 9, against 1/3, neutral 1 → 27/31, 1/31, 3/31 (hand computation).
    expect(table.yes.a).toBeCloseTo(27 / 31, 12);
    expect(table.no.a).toBeCloseTo(1 / 31, 12);
    expect(table.maybe.a).toBeCloseTo(3 / 31, 12);
    // b: rules out, neutral, neutral → 0, 1/2, 1/2; c: every answer but one rules it out → 0, 0, 1.
    expect([table.yes.b, table.no.b, table.maybe.b]).toEqual([0, 0.5, 0.5]);
    expect([table.yes.c, table.no.c, table.maybe.c]).toEqual([0, 0, 1]);
  });

  it("uses the weight table it is given", () => {
    const table = authoredLikelihoods(tree, { weights: { strong: 4, against: 0.5 } });
    expect(table.yes.a).toBeCloseTo(4 / 5.5, 12);
  });

  it("is what scoring uses: one answer moves equal priors in proportion to it (brute force)", () => {
    const table = authoredLikelihoods(tree);
    for (const o of ["yes", "no", "maybe"]) {
      const scores = scoreCauses(tree, [answer("q", o)], { unlistedShare: 0 });
      const total = table[o].a + table[o].b + table[o].c;
      for (const c of scores.causes) expect(c.probability).toBeCloseTo(table[o][c.causeId] / total, 12);
    }
  });
});
