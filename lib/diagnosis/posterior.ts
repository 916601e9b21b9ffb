import { DiagnosisError } from "./errors";
import { nodeLikelihood } from "./likelihood";
import { priorVector } from "./priors";
import type { ResolvedAnswer } from "./answers";
import type { Model } from "./model";
import type { DxAnswer } from "./types";

export interface Posterior {
  /** Over hypotheses: tree.causes in order, then unlisted when enabled. Sums to 1. */
  p: Float64Array;
  /** Per listed cause, the first answer that gave it likelihood 0. */
  ruledOutBy: (DxAnswer | null)[];
}

/** P(h | answers) ∝ prior_h · Π P(o_step | h), accumulated in log space. */
export function computePosterior(model: Model, answers: ResolvedAnswer[]): Posterior {
  const { H, K } = model;
  const prior = priorVector(model);
  const logP = new Float64Array(H);
  for (let h = 0; h < H; h++) logP[h] = Math.log(prior[h]);
  const ruledOutBy: (DxAnswer | null)[] = new Array(K).fill(null);

  for (const a of answers) {
    if (a.outcome < 0) continue; // "don't know" multiplies every hypothesis alike
    const { L } = nodeLikelihood(model, a.node);
    const row = a.outcome * H;
    for (let h = 0; h < H; h++) {
      const l = L[row + h];
      if (l === 0 && h < K && ruledOutBy[h] === null && logP[h] !== -Infinity) ruledOutBy[h] = a.answer;
      logP[h] += Math.log(l);
    }
  }

  let max = -Infinity;
  for (let h = 0; h < H; h++) if (logP[h] > max) max = logP[h];
  if (max === -Infinity) {
    throw new DiagnosisError("all_ruled_out", "The answers rule out every cause and the unlisted hypothesis is disabled");
  }
  const p = new Float64Array(H);
  let sum = 0;
  for (let h = 0; h < H; h++) {
    p[h] = Math.exp(logP[h] - max);
    sum += p[h];
  }
  for (let h = 0; h < H; h++) p[h] /= sum;
  return { p, ruledOutBy };
}
