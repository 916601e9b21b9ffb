import { describe, it, expect } from "vitest";
import { scoreCauses } from "@/lib/diagnosis";
import { answer, buildTree, question } from "./fixtures";

const byId = (scores: ReturnType<typeof scoreCauses>) => Object.fromEntries(scores.causes.map((c) => [c.causeId, c]));

describe("posterior by Bayes' theorem", () => {
  it("screening example: positive test, prior 0.01", () => {
    const tree = buildTree({
      causes: { disease: 0.01, healthy: 0.99 },
      nodes: [
        question("test", [
          { id: "positive", evidence: { disease: 0.8, healthy: 0.096 } },
          { id: "negative", evidence: { disease: 0.2, healthy: 0.904 } },
        ]),
      ],
    });
    const scores = scoreCauses(tree, [answer("test", "positive")], { unlistedShare: 0 });
    // Eddy 1982; Gigerenzer & Hoffrage, Psychological Review 102 (1995): posterior 0.077640.
    expect(byId(scores).disease.probability).toBeCloseTo(0.07764, 6);
    expect(scores.causes[0].causeId).toBe("healthy"); // sorted by probability, descending
    expect(scores.unlisted).toBe(0); // unlistedShare 0 disables the unlisted hypothesis
  });

  it("zero likelihood rules a hypothesis out and names the answer", () => {
    const yesNo = (id: string, yes: Record<string, number>) =>
      question(id, [
        { id: `${id}-yes`, evidence: yes },
        { id: `${id}-no`, evidence: Object.fromEntries(Object.entries(yes).map(([k, p]) => [k, 1 - p])) },
      ]);
    const tree = buildTree({
      causes: { banana: 0.5, orange: 0.3, other: 0.2 },
      nodes: [
        yesNo("long", { banana: 0.8, orange: 0, other: 0.5 }),
        yesNo("sweet", { banana: 0.7, orange: 0.5, other: 0.75 }),
        yesNo("yellow", { banana: 0.9, orange: 1, other: 0.25 }),
      ],
    });
    const answers = [answer("long", "long-yes"), answer("sweet", "sweet-yes"), answer("yellow", "yellow-yes")];
    const c = byId(scoreCauses(tree, answers, { unlistedShare: 0 }));
    // Public naive-Bayes tutorial example, recomputed: 0.930748 / 0 / 0.069252.
    expect(c.banana.probability).toBeCloseTo(0.930748, 6);
    expect(c.orange.probability).toBe(0);
    expect(c.other.probability).toBeCloseTo(0.069252, 6);
    // Same source: Orange is ruled out by "Long"; the others are not ruled out.
    expect(c.orange.ruledOutBy).toEqual(answer("long", "long-yes"));
    expect(c.banana.ruledOutBy).toBeNull();
  });
});

describe("priors (hand computation from the definition)", () => {
  const tree = buildTree({
    causes: { a: 3, b: 1 },
    nodes: [question("q", [{ id: "q-1" }, { id: "q-2" }])],
  });

  it("without history the priors are the editor's weights, scaled by 1 − unlisted share", () => {
    const s = scoreCauses(tree, []);
    expect(byId(s).a.probability).toBeCloseTo(0.75 * 0.95, 12); // w normalised, unlisted 0.05
    expect(s.unlisted).toBeCloseTo(0.05, 12); // the default unlisted share
  });

  it("history adds counts to α·w", () => {
    const s = scoreCauses(tree, [], { history: { a: 6, elsewhere: 40 }, priorStrength: 10, unlistedShare: 0.1 });
    // (6 + 10·0.75) / (6 + 10) = 0.84375 of the listed 0.9; counts for causes outside the tree are ignored.
    expect(byId(s).a.probability).toBeCloseTo(0.84375 * 0.9, 12);
    expect(byId(s).b.probability).toBeCloseTo(0.15625 * 0.9, 12);
  });

  it("the unlisted hypothesis is uniform over the options, so a neutral answer keeps its share", () => {
    const s = scoreCauses(tree, [answer("q", "q-1")], { unlistedShare: 0.2 });
    expect(s.unlisted).toBeCloseTo(0.2, 12); // definition: every hypothesis has P(o|h) = 1/2 here
  });
});
