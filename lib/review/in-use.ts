import type { LIKELIHOOD_MODES } from "@/db/schema";

export type LikelihoodMode = (typeof LIKELIHOOD_MODES)[number];

/**
 * Closed cases on a published version from which "auto" scores with learned likelihoods: the
 * smallest history the learning benchmark measures (`npm run bench learning`), where likelihoods
 * learned with the strength chosen from the data already score within half a point of top-1 of
 * the authored ones on trees that are right, and gain on trees that are not.
 */
export const ENOUGH_HISTORY = 100;

export interface InUse {
  source: "authored" | "learned";
  why: string;
}

/** Which likelihoods triage scores with on a tree, and why, from its setting and the closed cases of its published version. */
export function likelihoodsInUse(mode: LikelihoodMode, closedCases: number): InUse {
  if (mode === "authored") return { source: "authored", why: "A senior pinned the strengths written in the tree." };
  if (mode === "learned") return { source: "learned", why: "A senior chose the likelihoods learned from closed cases." };
  const count = `${closedCases} closed case${closedCases === 1 ? "" : "s"}`;
  return closedCases >= ENOUGH_HISTORY
    ? { source: "learned", why: `The published version has ${count}, enough (${ENOUGH_HISTORY} or more) to learn from. Each question's pull toward the tree is chosen from that history, so where the cases agree with the tree its values stand.` }
    : { source: "authored", why: `The published version has ${count}; learned likelihoods are used by default from ${ENOUGH_HISTORY}.` };
}
