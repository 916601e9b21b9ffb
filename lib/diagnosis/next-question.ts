import { effectiveAnswers, type ResolvedAnswer } from "./answers";
import { entropyOf, gainBits } from "./information";
import { nodeLikelihood, type NodeLikelihood } from "./likelihood";
import { buildModel, type Model } from "./model";
import { computePosterior } from "./posterior";
import { reachableFromRoot } from "./reachable";
import type { DxAnswer, DxSettings, DxTree, RankedQuestion } from "./types";

const SEPARATION_RATIO = 1.5;
const MAX_SEPARATES = 4;

/**
 * Unanswered question/check nodes reachable from the root (see reachableFromRoot), best
 * gain per minute first; ties by gain, then tree order. A node answered "don't know"
 * counts as answered. Cost is costMinutes, 1 minute when unset.
 */
export function rankNextQuestions(tree: DxTree, answers: DxAnswer[], settings?: DxSettings): RankedQuestion[] {
  const model = buildModel(tree, settings);
  const resolved = effectiveAnswers(model, answers);
  const { p } = computePosterior(model, resolved);
  return rankWithPosterior(model, resolved, p);
}

export function rankWithPosterior(model: Model, resolved: ResolvedAnswer[], p: Float64Array): RankedQuestion[] {
  const reachable = reachableFromRoot(model, resolved);
  for (const a of resolved) reachable[a.node] = 0;
  const entropy = entropyOf(p);
  const causeOrder = causesByProbability(model, p);

  const ranked: (RankedQuestion & { n: number })[] = [];
  model.tree.nodes.forEach((node, n) => {
    if (!reachable[n] || (node.kind !== "question" && node.kind !== "check")) return;
    const likelihood = nodeLikelihood(model, n);
    const gain = gainBits(p, likelihood, entropy);
    ranked.push({
      nodeId: node.id,
      gainBits: gain,
      gainPerMinute: gain / (node.costMinutes ?? 1),
      separates: separatedCauses(model, likelihood, causeOrder),
      n,
    });
  });
  ranked.sort((a, b) => b.gainPerMinute - a.gainPerMinute || b.gainBits - a.gainBits || a.n - b.n);
  return ranked.map(({ nodeId, gainBits: g, gainPerMinute, separates }) => ({ nodeId, gainBits: g, gainPerMinute, separates }));
}

/** Listed causes still possible, most probable first (ties in tree order). */
function causesByProbability(model: Model, p: Float64Array): number[] {
  const order: number[] = [];
  for (let k = 0; k < model.K; k++) if (p[k] > 0) order.push(k);
  return order.sort((a, b) => p[b] - p[a] || a - b);
}

/** Causes whose likelihood varies materially across the node's outcomes: some outcome rules it out, or max/min > 1.5. */
function separatedCauses(model: Model, { m, L, named }: NodeLikelihood, causeOrder: number[]): string[] {
  const H = model.H;
  const out: string[] = [];
  if (m < 2) return out;
  for (const k of causeOrder) {
    if (!named[k]) continue; // uniform by construction
    let min = Infinity;
    let max = 0;
    for (let o = 0; o < m; o++) {
      const l = L[o * H + k];
      if (l < min) min = l;
      if (l > max) max = l;
    }
    if (max > 0 && (min === 0 || max / min > SEPARATION_RATIO)) {
      out.push(model.tree.causes[k].id);
      if (out.length === MAX_SEPARATES) break;
    }
  }
  return out;
}
