import { describe, expect, it } from "vitest";
import { DEFAULT_WEIGHTS, weightTable } from "@/lib/diagnosis";
import { bestEdit, columnOf, proposalFor } from "@/lib/review/strength";
import { certaintySentence, proposalSentence, strengthSentence, suggestionSentence } from "@/lib/review/words";

// A node with four answers; for the cause in question they are neutral, neutral, against, neutral.
const outcomes = [
  { key: "load", strength: "neutral" as const },
  { key: "always", strength: "neutral" as const },
  { key: "bumps", strength: "against" as const },
  { key: "back", strength: "neutral" as const },
];

describe("the column a set of strengths gives, and the one change nearest a learned column", () => {
  it("normalises with the weights given, a change applied", () => {
    // Hand computation, P = λ / Σλ with weights 0, 1/3, 1, 3, 9: (1, 1, 1/3, 1) / (10/3).
    expect(columnOf(outcomes, DEFAULT_WEIGHTS)).toEqual([0.3, 0.3, 0.1, 0.3].map((x) => expect.closeTo(x, 12)));
    // "bumps" strong: (1, 1, 9, 1) / 12.
    expect(columnOf(outcomes, DEFAULT_WEIGHTS, { optionKey: "bumps", to: "strong" })[2]).toBeCloseTo(0.75, 12);
    // The shop's weights: against at 1/2 gives (1, 1, 1/2, 1) / 3.5.
    expect(columnOf(outcomes, weightTable({ against: 0.5 }))[2]).toBeCloseTo(0.5 / 3.5, 12);
  });

  it("proposes the change whose column is nearest the learned one", () => {
    // Learned: most of the cases clicked over bumps. Hand computation: bumps → strong gives (1, 1, 9, 1)/12,
    // the only single change that puts the bulk on bumps.
    const edit = bestEdit(outcomes, [0.05, 0.05, 0.85, 0.05], DEFAULT_WEIGHTS)!;
    expect(edit).toMatchObject({ optionKey: "bumps", from: "against", to: "strong" });
    expect(edit.column[2]).toBeCloseTo(0.75, 12);
  });

  it("proposes nothing when no single change comes nearer, and never 'rules out' for a value above 0", () => {
    expect(bestEdit(outcomes, [0.3, 0.3, 0.1, 0.3], DEFAULT_WEIGHTS)).toBeNull();
    const edit = bestEdit(outcomes, [0.32, 0.32, 0.01, 0.35], DEFAULT_WEIGHTS);
    expect(edit?.to).not.toBe("rules_out");
    expect(bestEdit(outcomes, [1 / 3, 1 / 3, 0, 1 / 3], DEFAULT_WEIGHTS)).toMatchObject({ optionKey: "bumps", to: "rules_out" });
    // proposalFor falls back to the answer furthest from the history, unchanged.
    expect(proposalFor(outcomes, [0.3, 0.3, 0.1, 0.3], [0.3, 0.28, 0.12, 0.3], DEFAULT_WEIGHTS)).toMatchObject({ optionKey: "bumps", from: "against", to: "against" });
  });
});

describe("the review in plain words", () => {
  const s = {
    causeName: "Mounting bolts loose", nodeTitle: "When does it click?", cases: 30, optionKey: "bumps",
    rows: [
      { optionKey: "load", optionLabel: "Under load", count: 2, authored: 0.3, learned: 0.1, strength: "neutral" as const },
      { optionKey: "bumps", optionLabel: "Over bumps", count: 28, authored: 0.1, learned: 0.9, strength: "against" as const },
    ],
    currentStrength: "against" as const, proposedStrength: "strong" as const, proposedColumn: [0.25, 0.75],
    strength: 2.7, strengthFrom: "column" as const,
  };

  it("says what the cases did against what the tree expects, and the change", () => {
    expect(suggestionSentence(s)).toBe("30 closed cases of “Mounting bolts loose” answered “When does it click?”; “Over bumps” came 28 times (93\u00a0%) where the tree expects 10\u00a0%.");
    expect(proposalSentence(s)).toBe("Change “Over bumps” from “against” to “strong” (the tree would then expect 75\u00a0%).");
    expect(strengthSentence(s)).toBe("Learned from this question's own history: the tree counts as 2.7 cases against the shop's 30.");
  });

  it("grades the Bayes factor on Kass & Raftery's scale (JASA 1995, p. 777)", () => {
    expect(certaintySentence(Math.log(2))).toContain("weak evidence (66.7 % sure");
    expect(certaintySentence(Math.log(10))).toContain("positive evidence");
    expect(certaintySentence(Math.log(50))).toContain("50 times likelier if the tree is off here than if it is right: strong evidence (98.0 % sure");
    expect(certaintySentence(Math.log(400))).toContain("very strong evidence");
    expect(certaintySentence(80)).toContain("over a million times likelier");
  });
});
