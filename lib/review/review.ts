import "server-only";
import { learnLikelihoods, type EvidenceColumn, type WeightTable } from "@/lib/diagnosis";
import { AppError } from "@/lib/errors";
import { loadGraph, toDxTree } from "@/lib/trees/graph";
import type { TreeGraph } from "@/lib/trees/graph-types";
import { closedCasesOf, shopWeights } from "./closed-cases";
import { proposalFor } from "./strength";
import type { ColumnRow, SuggestionView, VersionReview } from "./types";

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
 * learnLikelihoods over the closed cases of one tree version as they are now, with the shop's
 * strength weights for the authored side and the suggestions in the tree's own words.
 */
export async function reviewVersion(versionId: number): Promise<VersionReview> {
  return computeReview(versionId, await shopWeights());
}
