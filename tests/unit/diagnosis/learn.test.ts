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

const cases = (count: number, optionId: string, confirmedCauseId: string): ClosedCase[] =>
  Array.from({ length: count }, () => ({ answers: [answer("q", optionId)], confirmedCauseId }));

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

describe("learnLikelihoods (hand computation from the definition)", () => {
  const learned = learnLikelihoods(tree, closed);

  it("smooths the counts towards the authored likelihoods with m = 5", () => {
    const l = learned.likelihoods!;
    // N(q,yes,a) = 2, N(q,·,a) = 12: (2 + 5·0.75) / 17 and (10 + 5·0.25) / 17.
    expect(l.yes.a).toBeCloseTo(5.75 / 17, 12);
    expect(l.no.a).toBeCloseTo(11.25 / 17, 12);
    // N(q,yes,b) = 4, N(q,·,b) = 4: (4 + 2.5) / 9 and 2.5 / 9.
    expect(l.yes.b).toBeCloseTo(6.5 / 9, 12);
    expect(l.no.b).toBeCloseTo(2.5 / 9, 12);
    // Only options × causes with cases at that node; never "don't know", never an unasked node.
    expect(Object.keys(l).sort()).toEqual(["no", "yes"]);
  });

  it("suggests a review where |learned − authored| > 0.25 with at least 10 cases", () => {
    // Cause a: 12 cases, |0.338 − 0.75| = 0.41 on both options; cause b: only 4 cases, no suggestion.
    expect(learned.suggestions).toEqual([
      { optionId: "yes", causeId: "a", authored: 0.75, learned: 5.75 / 17, cases: 12 },
      { optionId: "no", causeId: "a", authored: 0.25, learned: 11.25 / 17, cases: 12 },
    ]);
  });

  it("a different m changes the smoothing", () => {
    expect(learnLikelihoods(tree, closed, 0).likelihoods!.yes.a).toBeCloseTo(2 / 12, 12); // m = 0: raw frequency
  });

  it("learned likelihoods override the authored ones in scoring", () => {
    const settings = { unlistedShare: 0, likelihoods: learned.likelihoods };
    const a = scoreCauses(tree, [answer("q", "yes")], settings).causes.find((c) => c.causeId === "a")!;
    // Equal priors: P(a|yes) = P̂(yes|a) / (P̂(yes|a) + P̂(yes|b)).
    expect(a.probability).toBeCloseTo(5.75 / 17 / (5.75 / 17 + 6.5 / 9), 12);
  });
});
