import "server-only";
import type { DxSettings } from "@/lib/diagnosis";
import { reviewVersion } from "./review";

/**
 * Learned P(o|k) for scoring a case on this tree version (option key → cause slug → p), for
 * trees whose likelihood setting is "learned". In-memory cache keyed by the version and the time
 * of its latest closed case, so a busy triage screen costs one small count query per call.
 */
export async function learnedLikelihoodsFor(treeVersionId: number): Promise<DxSettings["likelihoods"]> {
  return (await reviewVersion(treeVersionId)).likelihoods;
}
