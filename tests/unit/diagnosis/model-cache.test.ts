import { describe, expect, it } from "vitest";
import { rankingAfter, DiagnosisError, ModelCache, type DxAnswer, type DxSettings, type DxTree } from "@/lib/diagnosis";

// Two questions, three causes; the evidence is chosen so weights and learned values change the result.
const TREE: DxTree = {
  rootId: "q-noise",
  causes: [{ id: "bearing", priorWeight: 2 }, { id: "clutch", priorWeight: 1 }, { id: "gear", priorWeight: 1 }],
  nodes: [{ id: "q-noise", kind: "question" }, { id: "q-load", kind: "check", costMinutes: 10 }],
  options: [
    { id: "noise-yes", nodeId: "q-noise", to: "q-load", label: "Yes", evidence: { bearing: "strong", gear: "for" } },
    { id: "noise-no", nodeId: "q-noise", to: "q-load", label: "No", evidence: { bearing: "against", clutch: "for" } },
    { id: "noise-dk", nodeId: "q-noise", to: "q-load", label: "Don't know", dontKnow: true, evidence: {} },
    { id: "load-slip", nodeId: "q-load", to: null, label: "Slips", evidence: { clutch: "strong", bearing: "rules_out" } },
    { id: "load-ok", nodeId: "q-load", to: null, label: "Holds", evidence: { clutch: "against" } },
  ],
};

const ANSWER_SETS: DxAnswer[][] = [[], [{ nodeId: "q-noise", optionId: "noise-yes" }], [{ nodeId: "q-noise", optionId: "noise-no" }, { nodeId: "q-load", optionId: "load-ok" }]];
const SETTINGS: DxSettings[] = [
  {},
  { history: { clutch: 12 }, priorStrength: 4 },
  { weights: { strong: 20, against: 0.1 } },
  { unlistedShare: 0 },
  { likelihoods: { "noise-yes": { clutch: 0.9 } } },
  { stopThreshold: 0.5, minGainBits: 0.2 },
];

describe("ModelCache", () => {
  it("gives exactly what a freshly built model gives, for every mix of settings and answers, in any order", () => {
    const cache = new ModelCache(TREE);
    for (let round = 0; round < 2; round++) {
      for (const settings of round === 0 ? SETTINGS : [...SETTINGS].reverse()) {
        for (const answers of ANSWER_SETS) {
          expect(rankingAfter(TREE, answers, settings, cache)).toEqual(rankingAfter(TREE, answers, settings));
        }
      }
    }
  });

  it("tells apart learned likelihoods that differ, even when passed as new objects", () => {
    const cache = new ModelCache(TREE);
    const answers = [{ nodeId: "q-noise", optionId: "noise-yes" }];
    const a = rankingAfter(TREE, answers, { likelihoods: { "noise-yes": { clutch: 0.9 } } }, cache);
    const b = rankingAfter(TREE, answers, { likelihoods: { "noise-yes": { clutch: 0.1 } } }, cache);
    expect(a.causes).not.toEqual(b.causes);
    expect(b).toEqual(rankingAfter(TREE, answers, { likelihoods: { "noise-yes": { clutch: 0.1 } } }));
  });

  it("still checks bad settings and bad answers on every call", () => {
    const cache = new ModelCache(TREE);
    rankingAfter(TREE, [], {}, cache);
    expect(() => rankingAfter(TREE, [], { unlistedShare: 2 }, cache)).toThrow(DiagnosisError);
    expect(() => rankingAfter(TREE, [{ nodeId: "q-none", optionId: "x" }], {}, cache)).toThrow(DiagnosisError);
  });

  it("refuses a tree it was not made for", () => {
    const cache = new ModelCache(TREE);
    expect(() => rankingAfter({ ...TREE }, [], {}, cache)).toThrow(/only the tree it was made for/);
  });
});
