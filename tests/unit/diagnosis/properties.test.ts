import { describe, it, expect } from "vitest";
import fc from "fast-check";
import {
  DiagnosisError,
  entropyBits,
  expectedInformationGain,
  scoreCauses,
  type DxAnswer,
  type DxSettings,
  type DxTree,
  type Weight,
} from "@/lib/diagnosis";
import { buildTree, question } from "./fixtures";

const strength = fc.constantFrom<Weight>("rules_out", "against", "neutral", "for", "strong");
const anyWeight = fc.oneof(strength, fc.double({ min: 0, max: 20, noNaN: true }), fc.constant(undefined));

interface Case {
  tree: DxTree;
  answers: DxAnswer[];
  settings: DxSettings;
}

/** Random small trees: 1–5 causes, 1–5 questions of 2–4 options (some with "don't know"), random answers. */
function caseArb(weight: fc.Arbitrary<Weight | undefined>, withDontKnow: boolean): fc.Arbitrary<Case> {
  return fc.integer({ min: 1, max: 5 }).chain((K) => {
    const causeIds = Array.from({ length: K }, (_, k) => `cause-${k}`);
    const optionArb = fc.array(weight, { minLength: K, maxLength: K });
    const questionArb = fc.record({
      options: fc.array(optionArb, { minLength: 2, maxLength: 4 }),
      dontKnow: withDontKnow ? fc.boolean() : fc.constant(false),
      pick: fc.option(fc.nat(), { nil: undefined }),
    });
    return fc
      .record({
        priors: fc.array(fc.double({ min: 0, max: 10, noNaN: true }), { minLength: K, maxLength: K }),
        questions: fc.array(questionArb, { minLength: 1, maxLength: 5 }),
        unlistedShare: fc.constantFrom(0, 0.05, 0.3),
        history: fc.array(fc.nat({ max: 30 }), { minLength: K, maxLength: K }),
      })
      .map(({ priors, questions, unlistedShare, history }) => {
        const tree = buildTree({
          causes: Object.fromEntries(causeIds.map((id, k) => [id, priors[k]])),
          nodes: questions.map((q, i) =>
            question(`q${i}`, [
              ...q.options.map((weights, o) => ({
                id: `q${i}-o${o}`,
                evidence: Object.fromEntries(
                  weights.flatMap((w, k) => (w === undefined ? [] : [[causeIds[k], w] as [string, Weight]])),
                ),
              })),
              ...(q.dontKnow ? [{ id: `q${i}-dk`, dontKnow: true }] : []),
            ]),
          ),
        });
        const answers = questions.flatMap((q, i) =>
          q.pick === undefined ? [] : [{ nodeId: `q${i}`, optionId: `q${i}-o${q.pick % q.options.length}` }],
        );
        const settings: DxSettings = { unlistedShare, history: Object.fromEntries(causeIds.map((id, k) => [id, history[k]])) };
        return { tree, answers, settings };
      });
  });
}

/** Runs fn, discarding the case when the answers rule out every hypothesis (unlisted disabled). */
function unlessAllRuledOut<T>(fn: () => T): T {
  try {
    return fn();
  } catch (e) {
    fc.pre(!(e instanceof DiagnosisError && e.code === "all_ruled_out"));
    throw e;
  }
}

describe("engine properties", () => {
  it("posteriors sum to 1 and lie in [0, 1]", () => {
    fc.assert(
      fc.property(caseArb(anyWeight, true), ({ tree, answers, settings }) => {
        const s = unlessAllRuledOut(() => scoreCauses(tree, answers, settings));
        const total = s.causes.reduce((sum, c) => sum + c.probability, s.unlisted);
        expect(total).toBeCloseTo(1, 12); // probabilities plus unlisted sum to 1
        for (const c of s.causes) expect(c.probability >= 0 && c.probability <= 1).toBe(true);
        for (let i = 1; i < s.causes.length; i++) expect(s.causes[i - 1].probability).toBeGreaterThanOrEqual(s.causes[i].probability);
      }),
      { numRuns: 200 },
    );
  });

  it("answering \"don't know\" changes nothing", () => {
    fc.assert(
      fc.property(caseArb(anyWeight, true), ({ tree, answers, settings }) => {
        const answered = new Set(answers.map((a) => a.nodeId));
        const dontKnows = tree.options
          .filter((o) => o.dontKnow && !answered.has(o.nodeId))
          .map((o) => ({ nodeId: o.nodeId, optionId: o.id }));
        const before = unlessAllRuledOut(() => scoreCauses(tree, answers, settings));
        // "don't know" multiplies every hypothesis by the same factor.
        expect(scoreCauses(tree, [...dontKnows, ...answers], settings)).toEqual(before);
      }),
      { numRuns: 200 },
    );
  });

  it("information gain is never negative and never exceeds H(P)", () => {
    fc.assert(
      fc.property(caseArb(anyWeight, true), ({ tree, answers, settings }) => {
        const s = unlessAllRuledOut(() => scoreCauses(tree, answers, settings));
        const h = entropyBits([...s.causes.map((c) => c.probability), s.unlisted]);
        for (const node of tree.nodes) {
          const ig = expectedInformationGain(tree, answers, node.id, settings);
          // Mutual information I(H; O) is bounded by 0 and H(H) (Shannon; Mitchell 1997 ch. 3).
          expect(ig).toBeGreaterThanOrEqual(0);
          expect(ig).toBeLessThanOrEqual(h + 1e-12);
        }
      }),
      { numRuns: 150 },
    );
  });

  it("information gain equals H(P) − Σ P(o)·H(P|o) computed from scoreCauses' own updates", () => {
    const positive = fc.double({ min: 0.01, max: 20, noNaN: true });
    fc.assert(
      fc.property(caseArb(positive, false), ({ tree, settings }) => {
        const prior = scoreCauses(tree, [], settings);
        const pOf = (s: typeof prior) => [...tree.causes.map((c) => s.causes.find((x) => x.causeId === c.id)?.probability ?? 0), s.unlisted];
        const p = pOf(prior);
        for (const node of tree.nodes) {
          const options = tree.options.filter((o) => o.nodeId === node.id);
          // P(o|k) = λ(o,k) / Σ λ(o',k) and the unlisted uniform, recomputed here.
          const lambda = (o: (typeof options)[number], causeId: string) => Number(o.evidence[causeId] ?? 1);
          const likelihood = (o: (typeof options)[number], h: number) =>
            h < tree.causes.length
              ? lambda(o, tree.causes[h].id) / options.reduce((sum, x) => sum + lambda(x, tree.causes[h].id), 0)
              : 1 / options.length;
          let expected = 0;
          for (const o of options) {
            const po = p.reduce((sum, ph, h) => sum + ph * likelihood(o, h), 0);
            const after = pOf(scoreCauses(tree, [{ nodeId: node.id, optionId: o.id }], settings));
            expected += po * entropyBits(after);
          }
          // IG = H(P) − Σ_o P(o)·H(P|o).
          expect(expectedInformationGain(tree, [], node.id, settings)).toBeCloseTo(entropyBits(p) - expected, 9);
        }
      }),
      { numRuns: 100 },
    );
  });
});
