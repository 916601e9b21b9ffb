import { describe, it, expect } from "vitest";
import { learnLikelihoods, scoreCauses, type ClosedCase } from "@/lib/diagnosis";
import { answer, buildTree, question } from "./fixtures";

// One question: "yes" is evidence "for" cause a (λ 3 vs 1, so P_editor(yes|a) = 0.75); b is neutral (0.5).
const tree = buildTree({
  causes: { a: 1, b: 1 },
  nodes: [
    question("q", [
      { id: "yes", evidence: { a: "for" } },
      { id: "no" },
      { id: "unsure", dontKnow: true },
    ]),
    question("r", [{ id: "r-1" }, { id: "r-2" }]),
  ],
});

const cases = (count: number, optionId: string, confirmedCauseId: string, nodeId = "q"): ClosedCase[] =>
  Array.from({ length: count }, () => ({ answers: [answer(nodeId, optionId)], confirmedCauseId }));

const closed: ClosedCase[] = [
  ...cases(2, "yes", "a"),
  ...cases(10, "no", "a"),
  ...cases(3, "yes", "b"),
  // Counted once: the same answer twice in one case.
  { answers: [answer("q", "yes"), answer("q", "yes")], confirmedCauseId: "b" },
  // Not counted: "don't know", and a cause outside the tree.
  { answers: [answer("q", "unsure")], confirmedCauseId: "a" },
  { answers: [answer("q", "no")], confirmedCauseId: "somewhere-else" },
];

const column = (learned: ReturnType<typeof learnLikelihoods>, nodeId: string, causeId: string) =>
  learned.columns.find((c) => c.nodeId === nodeId && c.causeId === causeId)!;

describe("learnLikelihoods with a fixed strength: the m-estimate (N + m·P_editor) / (N(·) + m), by hand", () => {
  const learned = learnLikelihoods(tree, closed, 5);

  it("smooths the counts towards the authored likelihoods with m = 5", () => {
    const l = learned.likelihoods;
    // N(q,yes,a) = 2, N(q,·,a) = 12: (2 + 5·0.75) / 17 and (10 + 5·0.25) / 17.
    expect(l.yes.a).toBeCloseTo(5.75 / 17, 12);
    expect(l.no.a).toBeCloseTo(11.25 / 17, 12);
    // N(q,yes,b) = 4, N(q,·,b) = 4: (4 + 2.5) / 9 and 2.5 / 9.
    expect(l.yes.b).toBeCloseTo(6.5 / 9, 12);
    expect(l.no.b).toBeCloseTo(2.5 / 9, 12);
    // Only options × causes with cases at that node; never "don't know", never an unasked node.
    expect(Object.keys(l).sort()).toEqual(["no", "yes"]);
    expect(column(learned, "q", "a")).toMatchObject({ optionIds: ["yes", "no"], counts: [2, 10], cases: 12, authored: [0.75, 0.25], strength: 5, strengthFrom: "fixed" });
  });

  it("m = 0 gives the raw frequencies", () => {
    expect(learnLikelihoods(tree, closed, 0).likelihoods.yes.a).toBeCloseTo(2 / 12, 12);
  });

  it("learned likelihoods override the authored ones in scoring", () => {
    const settings = { unlistedShare: 0, likelihoods: learned.likelihoods };
    const a = scoreCauses(tree, [answer("q", "yes")], settings).causes.find((c) => c.causeId === "a")!;
    // Equal priors: P(a|yes) = P̂(yes|a) / (P̂(yes|a) + P̂(yes|b)).
    expect(a.probability).toBeCloseTo(5.75 / 17 / (5.75 / 17 + 6.5 / 9), 12);
  });

  it("uses the shop's strength weights for the authored side", () => {
    // "for" weighs 4 in this shop: P_editor(yes|a) = 4/5; with m = 5, (2 + 4) / 17.
    const shop = learnLikelihoods(tree, closed, 5, { weights: { for: 4 } });
    expect(column(shop, "q", "a").authored).toEqual([0.8, 0.2]);
    expect(shop.likelihoods.yes.a).toBeCloseTo(6 / 17, 12);
  });
});

describe("learnLikelihoods with the strength chosen from the data", () => {
  it("keeps the authored values where the counts follow them exactly, at any history size", () => {
    for (const n of [4, 40, 400]) {
      const history = [...cases(n * 3, "yes", "a"), ...cases(n, "no", "a"), ...cases(n, "yes", "b"), ...cases(n, "no", "b")];
      const learned = learnLikelihoods(tree, history);
      expect(learned.likelihoods.yes.a).toBe(0.75);
      expect(learned.likelihoods.no.a).toBe(0.25);
      expect(learned.likelihoods.yes.b).toBe(0.5);
      expect(learned.suggestions).toEqual([]);
    }
  });

  it("moves to the counts where they contradict the tree, the closer the more cases", () => {
    // The history answers "yes" for a only 20% of the time, against an authored 0.75.
    const gaps = [10, 40, 160, 640].map((n) => {
      const learned = learnLikelihoods(tree, [...cases(n * 0.2, "yes", "a"), ...cases(n * 0.8, "no", "a")]);
      return Math.abs(learned.likelihoods.yes.a - 0.2);
    });
    for (let i = 1; i < gaps.length; i++) expect(gaps[i]).toBeLessThan(gaps[i - 1]);
    expect(gaps[3]).toBeLessThan(0.01);
  });

  it("a thin column takes the tree-wide strength; a full one that clearly fits another strength gets its own", () => {
    const history = [
      ...cases(8, "yes", "a"), ...cases(32, "no", "a"), // far from the authored 0.75: pulls the tree-wide strength down
      ...cases(200, "yes", "b"), ...cases(200, "no", "b"), // exactly the authored 0.5, over 400 cases
      ...cases(3, "r-1", "a", "r"), ...cases(1, "r-2", "a", "r"), // 4 cases: thin
    ];
    const learned = learnLikelihoods(tree, history);
    expect(learned.treeStrength).toBeLessThan(20);
    expect(column(learned, "r", "a")).toMatchObject({ strengthFrom: "tree", strength: learned.treeStrength });
    expect(column(learned, "q", "b")).toMatchObject({ strengthFrom: "column", strength: Infinity, learned: [0.5, 0.5] });
    expect(column(learned, "q", "a").learned[0]).toBeLessThan(0.3);
  });

  it("puts a column to review when its Bayes factor reaches 20, not before", () => {
    const few = learnLikelihoods(tree, [...cases(2, "yes", "a"), ...cases(4, "no", "a")]);
    expect(few.suggestions).toEqual([]);
    const many = learnLikelihoods(tree, [...cases(8, "yes", "a"), ...cases(32, "no", "a")]);
    expect(many.suggestions.map((s) => [s.nodeId, s.causeId])).toEqual([["q", "a"]]);
    expect(many.suggestions[0].logBayesFactor).toBeGreaterThan(Math.log(20));
  });

  it("weighs an authored 'rules out' that the history contradicts instead of failing", () => {
    const ruled = buildTree({ causes: { a: 1, b: 1 }, nodes: [question("q", [{ id: "yes", evidence: { a: "rules_out" } }, { id: "no" }])] });
    const learned = learnLikelihoods(ruled, [...cases(10, "yes", "a"), ...cases(10, "no", "a")]);
    expect(learned.likelihoods.yes.a).toBeGreaterThan(0.3);
    expect(learned.suggestions.map((s) => s.causeId)).toEqual(["a"]);
  });
});
