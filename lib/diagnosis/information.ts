import { effectiveAnswers } from "./answers";
import { DiagnosisError } from "./errors";
import { requireNonNegative } from "./guards";
import { nodeLikelihood, type NodeLikelihood } from "./likelihood";
import { buildModel, nodeAt } from "./model";
import { computePosterior } from "./posterior";
import type { DxAnswer, DxSettings, DxTree } from "./types";

function xlog2x(x: number): number {
  return x > 0 ? x * Math.log2(x) : 0; // 0·log 0 = 0
}

/** Shannon entropy in bits. The values are normalised first, so class counts work too. */
export function entropyBits(p: number[]): number {
  if (!Array.isArray(p) || p.length === 0) throw new DiagnosisError("empty_input", "entropyBits needs at least one value");
  let sum = 0;
  for (const x of p) sum += requireNonNegative(x, "entropyBits value");
  if (sum === 0) throw new DiagnosisError("bad_probability", "entropyBits values sum to 0");
  let h = 0;
  for (const x of p) h -= xlog2x(x / sum);
  return Math.max(0, h);
}

/** Entropy in bits of a distribution that already sums to 1. */
export function entropyOf(p: Float64Array): number {
  let h = 0;
  for (let i = 0; i < p.length; i++) h -= xlog2x(p[i]);
  return Math.max(0, h);
}

/**
 * IG = H(P) − Σ_o P(o)·H(P|o) with P(o) = Σ_h P(h)·P(o|h). This equals the mutual
 * information H(O) − Σ_h P(h)·H(O|h), which needs one logarithm per outcome once the
 * column entropies H(O|h) are known. Rounding can push the result a hair outside
 * [0, H(P)]; it is clamped there.
 */
export function gainBits(p: Float64Array, node: NodeLikelihood, entropy: number): number {
  const { m, L, entropy: columnEntropy } = node;
  if (m < 2) return 0;
  const H = p.length;
  let outcomeEntropy = 0;
  for (let o = 0; o < m; o++) {
    const row = o * H;
    let po = 0;
    for (let h = 0; h < H; h++) po += p[h] * L[row + h];
    outcomeEntropy -= xlog2x(po);
  }
  let conditional = 0;
  for (let h = 0; h < H; h++) conditional += p[h] * columnEntropy[h];
  const ig = outcomeEntropy - conditional;
  return ig < 0 ? 0 : ig > entropy ? entropy : ig;
}

/** Expected gain in bits of asking node `nodeId` now; 0 for a node already answered. */
export function expectedInformationGain(tree: DxTree, answers: DxAnswer[], nodeId: string, settings?: DxSettings): number {
  const model = buildModel(tree, settings);
  const n = nodeAt(model, nodeId);
  const resolved = effectiveAnswers(model, answers);
  const { p } = computePosterior(model, resolved);
  if (resolved.some((a) => a.node === n)) return 0;
  return gainBits(p, nodeLikelihood(model, n), entropyOf(p));
}
