import { describe, expect, it } from "vitest";
import { likelihoodByStrength, nearestStrength } from "@/lib/review/strength";
import { proposalSentence, suggestionSentence } from "@/lib/review/words";

// A node with four answers; for the cause in question they are neutral, neutral, against, neutral.
const outcomes = [
  { key: "load", strength: "neutral" as const },
  { key: "always", strength: "neutral" as const },
  { key: "bumps", strength: "against" as const },
  { key: "back", strength: "neutral" as const },
];

describe("choosing the strength nearest a learned likelihood", () => {
  it("normalises each candidate against the node's other answers", () => {
    const v = likelihoodByStrength(outcomes, "bumps");
    // Hand computation from the definition (weights 0, 1/3, 1, 3, 9; P = λ / Σλ with the other three answers at 1 each).
    expect(v.rules_out).toBe(0);
    expect(v.against).toBeCloseTo(1 / 3 / (1 / 3 + 3), 12);
    expect(v.neutral).toBeCloseTo(1 / 4, 12);
    expect(v.for).toBeCloseTo(3 / 6, 12);
    expect(v.strong).toBeCloseTo(9 / 12, 12);
  });

  it("picks the nearest, never 'rules out' for a value above 0", () => {
    // Hand computation: learned 0.87 is nearest strong (0.75); 0.4 nearest for (0.5) rather than neutral (0.25).
    expect(nearestStrength(outcomes, "bumps", 0.87)).toEqual({ strength: "strong", value: 0.75 });
    expect(nearestStrength(outcomes, "bumps", 0.4).strength).toBe("for");
    // "load" is neutral among (1, 1/3, 1): against gives (1/3)/(2 + 2/3) = 0.125; rules out (0) is not offered for 0.03.
    expect(nearestStrength(outcomes, "load", 0.03)).toEqual({ strength: "against", value: 0.125 });
    expect(nearestStrength(outcomes, "load", 0).strength).toBe("rules_out");
  });

  it("every other answer ruling the cause out leaves the engine's uniform fallback", () => {
    const allOut = [{ key: "a", strength: "rules_out" as const }, { key: "b", strength: "rules_out" as const }];
    expect(likelihoodByStrength(allOut, "a")).toMatchObject({ rules_out: 0.5, strong: 1 });
  });

  it("says it in plain words", () => {
    expect(suggestionSentence({ optionLabel: "Over bumps", causeName: "Mounting bolts loose", authored: 0.1, learned: 0.8714, cases: 30 }))
      .toBe("Answer “Over bumps” → “Mounting bolts loose”: the tree says 0.10, shop history 0.87 over 30 cases.");
    expect(proposalSentence({ currentStrength: "against", proposedStrength: "strong", proposedValue: 0.75 }))
      .toBe("Change “against” to “strong” (the tree would then say 0.75).");
  });
});
