import "server-only";
import type { DxSettings } from "@/lib/diagnosis";
import { likelihoodsInUse, type LikelihoodMode } from "./in-use";
import { closedStampOf } from "./closed-cases";
import { reviewVersion } from "./review";

/**
 * The likelihoods to score a case on this tree version with (option key → cause slug → p), or
 * undefined where the tree's setting and history say the authored strengths. The learned values
 * are cached with the review (see reviewVersion), so a busy triage screen costs one small count query per call.
 */
export async function likelihoodsFor(treeVersionId: number, mode: LikelihoodMode): Promise<DxSettings["likelihoods"] | undefined> {
  if (mode === "authored") return undefined;
  if (mode === "auto" && likelihoodsInUse(mode, (await closedStampOf(treeVersionId)).closed).source === "authored") return undefined;
  return (await reviewVersion(treeVersionId)).likelihoods;
}
