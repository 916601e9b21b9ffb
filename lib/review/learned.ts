import "server-only";
import type { DxSettings } from "@/lib/diagnosis";
import { reviewVersion } from "./review";

/**
 * Learned P(o|k) for scoring a case on this tree version (option key → cause slug → p), for
 * trees whose likelihood setting is "learned", from the version's closed cases as they are now.
 */
export async function learnedLikelihoodsFor(treeVersionId: number): Promise<DxSettings["likelihoods"]> {
  return (await reviewVersion(treeVersionId)).likelihoods;
}
