import "server-only";
import { desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { trees, treeVersions } from "@/db/schema";
import type { Strength } from "@/lib/diagnosis";
import { loadGraph } from "@/lib/trees/graph";
import { likelihoodsInUse, type InUse, type LikelihoodMode } from "./in-use";
import { reviewVersion } from "./review";
import type { SuggestionView, VersionReview } from "./types";


export interface DraftMark {
  /** The draft's strength for this answer and cause; null when the draft has no such answer. */
  draftStrength: Strength | null;
}

export interface TreeReview {
  treeId: number;
  title: string;
  likelihoodMode: LikelihoodMode;
  inUse: InUse;
  published: VersionReview | null;
  draft: { versionId: number; number: number } | null;
  suggestions: (SuggestionView & DraftMark)[];
}

async function latestVersions(treeId: number) {
  const rows = await db
    .select({ id: treeVersions.id, number: treeVersions.number, state: treeVersions.state })
    .from(treeVersions)
    .where(eq(treeVersions.treeId, treeId))
    .orderBy(desc(treeVersions.number));
  return { published: rows.find((v) => v.state === "published") ?? null, draft: rows.find((v) => v.state === "draft") ?? null };
}

/** Evidence review of a tree: suggestions learned on its latest published version, checked against its draft. */
export async function treeReview(treeId: number): Promise<TreeReview | null> {
  const [tree] = await db.select({ id: trees.id, title: trees.title, mode: trees.likelihoodMode }).from(trees).where(eq(trees.id, treeId)).limit(1);
  if (!tree) return null;
  const { published, draft } = await latestVersions(treeId);
  const review = published ? await reviewVersion(published.id) : null;
  const draftGraph = draft && review?.suggestions.length ? await loadGraph(draft.id) : null;
  const suggestions = (review?.suggestions ?? []).map((s) => {
    if (!draftGraph) return { ...s, draftStrength: s.currentStrength };
    const option = draftGraph.options.find((o) => o.key === s.optionKey);
    return { ...s, draftStrength: option ? option.evidence[s.causeSlug] ?? "neutral" : null };
  });
  return {
    treeId: tree.id, title: tree.title, likelihoodMode: tree.mode, inUse: likelihoodsInUse(tree.mode, review?.cases ?? 0), published: review,
    draft: draft ? { versionId: draft.id, number: draft.number } : null, suggestions,
  };
}

export interface DigestItem extends SuggestionView, DraftMark {
  treeTitle: string;
  draftNumber: number | null;
}

/** The largest open suggestions across all trees in use, for the senior mechanic's home. */
export async function reviewDigest(limit = 5): Promise<{ items: DigestItem[]; total: number }> {
  const rows = await db.select({ id: trees.id }).from(trees).where(eq(trees.archived, false)).orderBy(trees.id);
  const reviews = (await Promise.all(rows.map((t) => treeReview(t.id)))).filter((r): r is TreeReview => r !== null);
  const all = reviews.flatMap((review) =>
    review.suggestions
      .filter((s) => s.proposedStrength !== s.currentStrength && s.draftStrength !== null)
      .map((s) => ({ ...s, treeTitle: review.title, draftNumber: review.draft?.number ?? null })));
  all.sort((a, b) => b.logBayesFactor - a.logBayesFactor || b.cases - a.cases);
  return { items: all.slice(0, limit), total: all.length };
}
