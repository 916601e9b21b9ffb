import type { Edge, Node } from "@xyflow/react";
import type { TreeProblem } from "@/lib/diagnosis";
import type { DraftGraph, DraftNode, DraftOption } from "@/lib/trees/draft";

export interface TreeNodeData extends Record<string, unknown> {
  node: DraftNode;
  isRoot: boolean;
  causeName: string | null;
  problems: string[];
  /** Changes when anything drawn changes; lets unchanged nodes keep their object (and skip a render). */
  signature: string;
}
export type TreeFlowNode = Node<TreeNodeData, "treeNode">;

export interface TreeEdgeData extends Record<string, unknown> {
  option: DraftOption;
  problem: boolean;
}
export type TreeFlowEdge = Edge<TreeEdgeData>;

const shortLabel = (label: string) => (label.length > 30 ? `${label.slice(0, 28)}…` : label);

/**
 * Turns the draft into canvas nodes, reusing each previous node whose drawing is unchanged and
 * carrying over what the canvas measured and selected, so a keystroke re-renders one node, not 300.
 */
export function reconcileNodes(
  previous: readonly TreeFlowNode[],
  draft: DraftGraph,
  problemsOf: ReadonlyMap<string, TreeProblem[]>,
  causeNameOf: ReadonlyMap<string, string>,
): TreeFlowNode[] {
  const before = new Map(previous.map((n) => [n.id, n]));
  let same = previous.length === draft.nodes.length;
  const next = draft.nodes.map((node, i) => {
    const problems = (problemsOf.get(node.key) ?? []).map((p) => p.message);
    const isRoot = draft.rootKey === node.key;
    const causeName = node.causeSlug ? causeNameOf.get(node.causeSlug) ?? node.causeSlug : null;
    const signature = `${isRoot ? 1 : 0}|${causeName ?? ""}|${problems.join("\u0001")}`;
    const old = before.get(node.key);
    if (old && old.data.node === node && old.data.signature === signature) {
      if (previous[i] !== old) same = false;
      return old;
    }
    same = false;
    return {
      id: node.key,
      type: "treeNode" as const,
      position: { x: node.posX, y: node.posY },
      data: { node, isRoot, causeName, problems, signature },
      selected: old?.selected ?? false,
      ...(old?.measured ? { measured: old.measured } : {}),
    };
  });
  return same ? (previous as TreeFlowNode[]) : next;
}

export function reconcileEdges(previous: readonly TreeFlowEdge[], draft: DraftGraph, problemOptions: ReadonlySet<string>): TreeFlowEdge[] {
  const before = new Map(previous.map((e) => [e.id, e]));
  const keys = new Set(draft.nodes.map((n) => n.key));
  let same = true;
  const next: TreeFlowEdge[] = [];
  for (const option of draft.options) {
    if (!option.toKey || !keys.has(option.toKey) || !keys.has(option.fromKey)) continue;
    const problem = problemOptions.has(option.key);
    const old = before.get(option.key);
    if (old && old.data?.option === option && old.data.problem === problem) {
      if (previous[next.length] !== old) same = false;
      next.push(old);
      continue;
    }
    same = false;
    next.push({
      id: option.key,
      source: option.fromKey,
      target: option.toKey,
      label: shortLabel(option.label || "(no label)"),
      data: { option, problem },
      selected: old?.selected ?? false,
      className: [option.dontKnow ? "rb-edge-dontknow" : "", problem ? "rb-edge-problem" : ""].join(" ").trim() || undefined,
      labelBgPadding: [4, 2],
      labelBgBorderRadius: 3,
    });
  }
  return same && next.length === previous.length ? (previous as TreeFlowEdge[]) : next;
}
