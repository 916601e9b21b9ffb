import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { RANKING_SUGGESTIONS, rankingAfter, rankNextQuestions, scoreCauses, suggestConclusion, type DxAnswer, type DxTree } from "@/lib/diagnosis";

// A small tree generator: a chain of questions with three options each and random evidence.
const STRENGTHS = ["rules_out", "against", "neutral", "for", "strong"] as const;
function tree(evidence: number[][], prior: number[]): DxTree {
  const causes = prior.map((w, k) => ({ id: `c${k}`, priorWeight: w + 1 }));
  const n = evidence.length;
  return {
    rootId: "q0",
    causes,
    nodes: Array.from({ length: n }, (_, i) => ({ id: `q${i}`, kind: "question" as const })),
    options: evidence.flatMap((row, i) => [0, 1, 2].map((j) => ({
      id: `q${i}o${j}`, nodeId: `q${i}`, to: i + 1 < n ? `q${i + 1}` : null, label: `option ${j}`,
      evidence: Object.fromEntries(causes.map((c, k) => [c.id, STRENGTHS[(row[(j + k) % row.length] ?? 2) % 5]])),
    }))),
  };
}

describe("rankingAfter", () => {
  it("gives exactly what scoreCauses, rankNextQuestions (the first few) and suggestConclusion give separately", () => {
    fc.assert(fc.property(
      fc.array(fc.array(fc.integer({ min: 0, max: 4 }), { minLength: 3, maxLength: 3 }), { minLength: 2, maxLength: 6 }),
      fc.array(fc.integer({ min: 0, max: 5 }), { minLength: 2, maxLength: 5 }),
      fc.integer({ min: 0, max: 5 }),
      (evidence, prior, answered) => {
        const t = tree(evidence, prior);
        const answers: DxAnswer[] = Array.from({ length: Math.min(answered, evidence.length) }, (_, i) => ({ nodeId: `q${i}`, optionId: `q${i}o${i % 3}` }));
        let separate;
        try {
          const scores = scoreCauses(t, answers);
          separate = {
            causes: scores.causes,
            unlisted: scores.unlisted,
            suggestions: rankNextQuestions(t, answers).slice(0, RANKING_SUGGESTIONS),
            conclusion: suggestConclusion(t, answers),
          };
        } catch (error) {
          expect(() => rankingAfter(t, answers)).toThrow((error as Error).message);
          return;
        }
        expect(rankingAfter(t, answers)).toEqual(separate);
      },
    ), { numRuns: 200 });
  });
});
