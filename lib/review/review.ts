import "server-only";
import { learnLikelihoods, weightTable, type EvidenceColumn, type WeightTable } from "@/lib/diagnosis";
import { AppError } from "@/lib/errors";
import { loadGraph, toDxTree } from "@/lib/trees/graph";
import type { TreeGraph } from "@/lib/trees/graph-types";
import { closedCasesOf, closedStampOf, shopWeights } from "./closed-cases";
import { proposalFor } from "./strength";
import type { ColumnRow, SuggestionView, VersionReview } from "./types";

const MAX_CACHED = 64;
const globalCache = globalThis as unknown as { rootbenchReviews?: Map<number, { stamp: string; review: Promise<VersionReview> }> };
// Keyed by version; an entry is good while no case of the version has closed (or reopened) and the shop's weights are the same.
const cache = (globalCache.rootbenchReviews ??= new Map());

function suggestionView(graph: TreeGraph, column: EvidenceColumn, weights: WeightTable): SuggestionView {
  const optionByKey = new Map(graph.options.map((o) => [o.key, o]));
  const node = graph.nodes.find((n) => n.key === column.nodeId);
  const rows: ColumnRow[] = column.optionIds.map((key, o) => {
    const option = optionByKey.get(key)!;
    return {
      optionKey: key, optionLabel: option.label, count: column.counts[o], authored: column.authored[o], learned: column.learned[o],
      strength: option.evidence[column.causeId] ?? "neutral",
    };
  });
  const edit = proposalFor(rows.map((r) => ({ key: r.optionKey, strength: r.strength })), column.authored, column.learned, weights);
  const changed = rows.find((r) => r.optionKey === edit.optionKey)!;
  return {
    treeId: graph.treeId, versionId: graph.versionId, nodeKey: column.nodeId, nodeTitle: node?.title || node?.prompt || column.nodeId,
    causeSlug: column.causeId, causeName: graph.causes.find((c) => c.slug === column.causeId)?.name ?? column.causeId,
    cases: column.cases, rows, logBayesFactor: column.logBayesFactor, strength: column.strength, strengthFrom: column.strengthFrom,
    optionKey: changed.optionKey, optionLabel: changed.optionLabel, currentStrength: changed.strength,
    proposedStrength: edit.to, proposedColumn: edit.column,
  };
}

async function computeReview(versionId: number, weights: WeightTable): Promise<VersionReview> {
  const graph = await loadGraph(versionId);
  if (!graph) throw new AppError("not_found", "That tree version does not exist.");
  const closed = await closedCasesOf(versionId);
  const learned = learnLikelihoods(toDxTree(graph), closed, undefined, { weights });
  const suggestions = learned.suggestions.map((c) => suggestionView(graph, c, weights));
  suggestions.sort((a, b) => b.logBayesFactor - a.logBayesFactor || b.cases - a.cases);
  return {
    treeId: graph.treeId, versionId, versionNumber: graph.number, cases: closed.length, treeStrength: learned.treeStrength,
    likelihoods: learned.likelihoods, suggestions,
  };
}

/**
 * learnLikelihoods over the closed cases of one tree version, with the shop's strength weights for
 * the authored side and the suggestions in the tree's own words. Cached in memory per version
 * until another case of it closes or reopens, or the shop's weights change.
 */
export async function reviewVersion(versionId: number): Promise<VersionReview> {
  const stamp = await closedStampOf(versionId);
  const weights = weightTable(shopWeights(stamp));
  const key = `${stamp.closed}|${stamp.latest ?? ""}|${JSON.stringify(weights)}`;
  const hit = cache.get(versionId);
  if (hit && hit.stamp === key) return hit.review;
  const review = computeReview(versionId, weights);
  cache.delete(versionId);
  cache.set(versionId, { stamp: key, review });
  review.catch(() => cache.delete(versionId));
  while (cache.size > MAX_CACHED) cache.delete(cache.keys().next().value as number);
  return review;
}

/** Drops cached reviews (tests, and after an import that adds closed cases). */
export function forgetReviews(): void {
  cache.clear();
}
