import type { Model } from "./model";

/**
 * prior_k ∝ n_k + α·w_k over the listed causes (w = editor weights normalised to sum 1),
 * scaled to 1 − unlistedShare; the unlisted hypothesis gets unlistedShare.
 * All editor weights 0 means "no preference": w is uniform. With α = 0 and no history
 * the counts carry no mass, so the editor's weights are used alone.
 */
export function priorVector(model: Model): Float64Array {
  const { K, H, hasUnlisted } = model;
  const { history, priorStrength, unlistedShare } = model.settings;
  const prior = new Float64Array(H);
  if (K === 0) {
    prior[0] = 1;
    return prior;
  }
  const causes = model.tree.causes;
  let weightSum = 0;
  for (const c of causes) weightSum += c.priorWeight;
  const w = (k: number) => (weightSum > 0 ? causes[k].priorWeight / weightSum : 1 / K);

  let total = 0;
  for (let k = 0; k < K; k++) {
    const id = causes[k].id;
    prior[k] = (Object.hasOwn(history, id) ? history[id] : 0) + priorStrength * w(k);
    total += prior[k];
  }
  if (total === 0) {
    for (let k = 0; k < K; k++) prior[k] = w(k);
    total = 1;
  }
  const listedShare = hasUnlisted ? 1 - unlistedShare : 1;
  for (let k = 0; k < K; k++) prior[k] = (prior[k] / total) * listedShare;
  if (hasUnlisted) prior[K] = unlistedShare;
  return prior;
}
