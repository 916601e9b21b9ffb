import { requireProbability } from "./guards";
import { buildModel, type Model } from "./model";
import type { DxSettings, DxTree } from "./types";

/** P(o|h) of one node, with what information gain needs precomputed. */
export interface NodeLikelihood {
  /** Number of outcomes (options other than "don't know"). */
  m: number;
  /** Row-major m × H: entry [o * H + h] is P(o|h). */
  L: Float64Array;
  /** H(O | h) in bits for each hypothesis. */
  entropy: Float64Array;
  /** 1 where the column is not uniform by construction (the node's evidence or a learned value names the cause). */
  named: Uint8Array;
}

/**
 * Per cause k: λ(o,k) from the evidence (unnamed causes neutral), normalised over the
 * outcomes. Learned values in settings.likelihoods replace λ-based ones where present,
 * and the column is renormalised so a partial override still sums to 1. A column that
 * sums to 0 (every outcome rules k out) is treated as neutral: uniform. The unlisted
 * hypothesis is uniform over the outcomes. A cause the node never names is uniform too,
 * which is why only named columns are computed one by one.
 */
export function nodeLikelihood(model: Model, n: number): NodeLikelihood {
  const cached = model.matrices[n];
  if (cached) return cached;

  const { K, H } = model;
  const outcomes = model.outcomesOf[n];
  const m = outcomes.length;
  const L = model.arena.take(m * H);
  const entropy = model.arena.take(H);
  const named = new Uint8Array(H);
  const result: NodeLikelihood = { m, L, entropy, named };
  model.matrices[n] = result;
  if (m === 0) return result;

  L.fill(1 / m);
  entropy.fill(Math.log2(m));
  const table = model.settings.weights;
  const neutral = table.neutral;
  const learned = model.settings.likelihoods;

  for (let o = 0; o < m; o++) {
    const evidence = outcomes[o].evidence;
    const causeIds = Object.keys(evidence ?? {});
    for (let e = 0; e < causeIds.length; e++) {
      const causeId = causeIds[e];
      // Evidence for a cause outside the tree cannot affect scoring; validateTree reports it.
      const k = model.causeIndex.get(causeId);
      if (k === undefined) continue;
      if (!named[k]) {
        named[k] = 1;
        for (let i = 0; i < m; i++) L[i * H + k] = neutral;
      }
      const w = evidence[causeId]; // checked in buildModel
      L[o * H + k] = typeof w === "number" ? w : table[w];
    }
  }
  for (let k = 0; k < K; k++) if (named[k]) normaliseColumn(L, m, H, k);

  let overridden = false;
  for (let o = 0; o < m; o++) {
    const id = outcomes[o].id;
    if (!Object.hasOwn(learned, id)) continue;
    for (const [causeId, p] of Object.entries(learned[id])) {
      const k = model.causeIndex.get(causeId);
      if (k === undefined) continue;
      if (!(typeof p === "number" && p >= 0 && p <= 1)) {
        requireProbability(p, `settings.likelihoods[${JSON.stringify(id)}][${JSON.stringify(causeId)}]`, "bad_setting");
      }
      named[k] = 1;
      L[o * H + k] = p;
      overridden = true;
    }
  }
  if (overridden) for (let k = 0; k < K; k++) if (named[k]) normaliseColumn(L, m, H, k);

  for (let k = 0; k < K; k++) {
    if (!named[k]) continue;
    let h = 0;
    for (let o = 0; o < m; o++) {
      const l = L[o * H + k];
      if (l > 0) h -= l * Math.log2(l);
    }
    entropy[k] = h;
  }
  return result;
}

/**
 * The engine's normalisation of one cause's weights over a node's outcomes ("don't know" left out):
 * P(o|k) = λ(o,k) / Σ_o' λ(o',k), uniform when every λ is 0 (every answer rules k out).
 */
export function normaliseWeights(weights: readonly number[]): number[] {
  const sum = weights.reduce((a, b) => a + b, 0);
  return weights.map((w) => (sum > 0 ? w / sum : 1 / weights.length));
}

/**
 * The authored P(o|k) of every outcome of every node for every cause (option id → cause id → p),
 * from the evidence and the weight table in `settings.weights` (the shop's, or the defaults);
 * learned likelihoods are not applied. "Don't know" options have no entry: they are neutral.
 */
export function authoredLikelihoods(tree: DxTree, settings: Pick<DxSettings, "weights"> = {}): Record<string, Record<string, number>> {
  const model = buildModel(tree, { weights: settings.weights });
  const table: Record<string, Record<string, number>> = {};
  for (let n = 0; n < tree.nodes.length; n++) {
    const { L } = nodeLikelihood(model, n);
    model.outcomesOf[n].forEach((option, o) => {
      const row: Record<string, number> = (table[option.id] = {});
      tree.causes.forEach((cause, k) => (row[cause.id] = L[o * model.H + k]));
    });
  }
  return table;
}

function normaliseColumn(L: Float64Array, m: number, H: number, k: number): void {
  let sum = 0;
  for (let o = 0; o < m; o++) sum += L[o * H + k];
  for (let o = 0; o < m; o++) L[o * H + k] = sum > 0 ? L[o * H + k] / sum : 1 / m;
}
