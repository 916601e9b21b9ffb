import "server-only";
import { learnLikelihoods, type Strength } from "@/lib/diagnosis";
import { AppError } from "@/lib/errors";
import { loadGraph, toDxTree } from "@/lib/trees/graph";
import type { TreeGraph } from "@/lib/trees/graph-types";
import { closedCasesOf } from "./closed-cases";
import { nearestStrength } from "./strength";
import type { SuggestionView, VersionReview } from "./types";

function strengthOf(graph: TreeGraph, optionKey: string, causeSlug: string): Strength {
  return graph.options.find((o) => o.key === optionKey)?.evidence[causeSlug] ?? "neutral";
}

async function computeReview(versionId: number): Promise<VersionReview> {
  const graph = await loadGraph(versionId);
  if (!graph) throw new AppError("not_found", "That tree version does not exist.");
  const closed = await closedCasesOf(versionId);
  const { likelihoods, suggestions } = learnLikelihoods(toDxTree(graph), closed);
  const nodeByKey = new Map(graph.nodes.map((n) => [n.key, n]));
  const optionByKey = new Map(graph.options.map((o) => [o.key, o]));
  const causeName = new Map(graph.causes.map((c) => [c.slug, c.name]));

  const views: SuggestionView[] = suggestions.map((s) => {
    const option = optionByKey.get(s.optionId)!;
    const outcomes = graph.options
      .filter((o) => o.fromKey === option.fromKey && !o.dontKnow)
      .map((o) => ({ key: o.key, strength: strengthOf(graph, o.key, s.causeId) }));
    const proposed = nearestStrength(outcomes, option.key, s.learned);
    const node = nodeByKey.get(option.fromKey);
    return {
      treeId: graph.treeId, versionId, nodeKey: option.fromKey, nodeTitle: node?.title || node?.prompt || option.fromKey,
      optionKey: option.key, optionLabel: option.label, causeSlug: s.causeId, causeName: causeName.get(s.causeId) ?? s.causeId,
      authored: s.authored, learned: s.learned, cases: s.cases,
      currentStrength: strengthOf(graph, option.key, s.causeId), proposedStrength: proposed.strength, proposedValue: proposed.value,
    };
  });
  views.sort((a, b) => Math.abs(b.learned - b.authored) - Math.abs(a.learned - a.authored) || b.cases - a.cases);
  return { treeId: graph.treeId, versionId, versionNumber: graph.number, cases: closed.length, likelihoods: likelihoods ?? {}, suggestions: views };
}

/** learnLikelihoods over the closed cases of one tree version, with the suggestions in the tree's own words. */
export function reviewVersion(versionId: number): Promise<VersionReview> {
  return computeReview(versionId);
}
