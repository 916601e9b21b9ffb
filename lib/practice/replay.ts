import { walkPath, type DxAnswer, type DxTree, type Ranking } from "@/lib/diagnosis";
import type { TreeGraph } from "@/lib/trees/graph-types";
import { toDxTree } from "@/lib/trees/graph";
import type { PracticeReplay, PracticeStep, RankingView } from "./types";

export interface RecordedStep {
  nodeId: number;
  optionId: number;
  /** The ranking the technician's screen showed after this answer, as the step stored it. */
  ranking: Ranking;
}

export interface CaseFacts {
  caseId: number;
  family: string;
  symptom: string;
  treeTitle: string;
  ridingUse: string;
  callerKind: string;
}

function rankingView(ranking: Ranking, graph: TreeGraph): RankingView {
  const nameOf = new Map(graph.causes.map((c) => [c.slug, c.name]));
  const labelOf = new Map(graph.options.map((o) => [o.key, o.label]));
  const nodeTitleOf = new Map(graph.nodes.map((n) => [n.key, n.title || n.prompt]));
  return {
    unlisted: ranking.unlisted,
    causes: ranking.causes.map((c) => ({
      slug: c.causeId,
      name: nameOf.get(c.causeId) ?? c.causeId,
      probability: c.probability,
      ruledOutBy: c.ruledOutBy ? `${nodeTitleOf.get(c.ruledOutBy.nodeId) ?? "a question"}: “${labelOf.get(c.ruledOutBy.optionId) ?? "?"}”` : null,
    })),
  };
}

function cautionsAfter(dx: DxTree, answers: DxAnswer[], graph: TreeGraph): string[] {
  const textOf = new Map(graph.nodes.filter((n) => n.kind === "caution").map((n) => [n.key, n.cautionText || n.prompt]));
  try {
    return walkPath(dx, answers).cautions.map((key) => textOf.get(key) ?? "").filter(Boolean);
  } catch {
    return [];
  }
}

/**
 * Replays a closed case on the tree version it was walked on: each recorded answer with the node
 * that asked it, the ranking its step stored (what the technician saw), and the cautions the walk
 * reached. `start` is the ranking before the first answer, which no step stores.
 */
export function buildReplay(facts: CaseFacts, graph: TreeGraph, recorded: RecordedStep[], start: Ranking): PracticeReplay {
  const dx = toDxTree(graph);
  const nodeById = new Map(graph.nodes.map((n) => [n.id, n]));
  const optionById = new Map(graph.options.map((o) => [o.id, o]));
  const answers: DxAnswer[] = [];
  const steps: PracticeStep[] = [];
  const rankings: RankingView[] = [rankingView(start, graph)];
  const openingCautions = cautionsAfter(dx, [], graph);
  let seen = new Set(openingCautions);
  for (const [i, r] of recorded.entries()) {
    const node = nodeById.get(r.nodeId);
    const option = optionById.get(r.optionId);
    if (!node || !option || (node.kind !== "question" && node.kind !== "check")) continue;
    answers.push({ nodeId: node.key, optionId: option.key });
    const cautions = cautionsAfter(dx, answers, graph);
    steps.push({
      seq: i + 1, kind: node.kind, title: node.title, prompt: node.prompt, answer: option.label, dontKnow: option.dontKnow,
      cautions: cautions.filter((c) => !seen.has(c)),
    });
    seen = new Set(cautions);
    rankings.push(rankingView(r.ranking, graph));
  }
  return {
    ...facts, steps, rankings, openingCautions,
    choices: [...graph.causes].sort((a, b) => a.name.localeCompare(b.name)).map((c) => ({ slug: c.slug, name: c.name })),
  };
}
