import "server-only";
import type { DxSettings } from "@/lib/diagnosis";
import { closedCountOf } from "./closed-cases";
import { likelihoodsInUse, type LikelihoodMode } from "./in-use";
import { reviewVersion } from "./review";

/**
 * The likelihoods to score a case on this tree version with (option key → cause slug → p), learned
 * from the version's closed cases as they are now, or undefined where the tree's setting and
 * history say the authored strengths.
 */
export async function likelihoodsFor(treeVersionId: number, mode: LikelihoodMode): Promise<DxSettings["likelihoods"] | undefined> {
  if (mode === "authored") return undefined;
  if (mode === "auto" && likelihoodsInUse(mode, await closedCountOf(treeVersionId)).source === "authored") return undefined;
  return (await reviewVersion(treeVersionId)).likelihoods;
}
