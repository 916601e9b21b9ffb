import { describe, it, expect } from "vitest";
import { scoreCauses, suggestConclusion } from "@/lib/diagnosis";
import { answer, buildTree, question, workshopTree } from "./fixtures";

// The stop rule ("top cause reaches 0.8 … or no remaining node has IG above 0.05 bits").
describe("suggestConclusion", () => {
  const tree = workshopTree();

  it("continues while informative questions remain and nothing reaches 0.8", () => {
    const s = suggestConclusion(tree, []);
    expect(s.kind).toBe("continue");
    expect(s.causeId).toBe("clutch-worn"); // the leader so far: prior weight 3 of 6
    expect(s.probability).toBeCloseTo(0.5 * 0.95, 12);
  });

  it("concludes with the cause once it reaches the threshold", () => {
    const answers = [answer("noise", "noise-grind"), answer("wet", "wet-yes")];
    const top = scoreCauses(tree, answers).causes[0];
    expect(top.probability).toBeGreaterThanOrEqual(0.8);
    expect(suggestConclusion(tree, answers)).toEqual({ kind: "cause", causeId: "bearing-wet", probability: top.probability });
    expect(suggestConclusion(tree, answers, { stopThreshold: 0.999 }).kind).toBe("cause"); // nothing informative is left either
  });

  it("says unlisted when the answers rule out every listed cause", () => {
    const t = buildTree({
      causes: { a: 1, b: 1 },
      nodes: [question("q", [{ id: "q-none", evidence: { a: 0, b: 0 } }, { id: "q-some" }])],
    });
    expect(suggestConclusion(t, [answer("q", "q-none")])).toEqual({ kind: "unlisted", probability: 1 });
  });

  it("says unlisted when it leads and nothing informative remains", () => {
    const t = buildTree({ causes: { a: 1, b: 1 }, nodes: [question("q", [{ id: "q-1" }, { id: "q-2" }])] });
    expect(suggestConclusion(t, [], { unlistedShare: 0.6 })).toEqual({ kind: "unlisted", probability: 0.6 });
    expect(suggestConclusion(t, [], { unlistedShare: 0.2 })).toEqual({ kind: "cause", causeId: "a", probability: 0.4 });
  });

  it("minGainBits sets what counts as informative", () => {
    expect(suggestConclusion(tree, [], { minGainBits: 100 }).kind).toBe("cause");
  });
});
