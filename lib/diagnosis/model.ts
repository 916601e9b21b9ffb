import { Float64Arena } from "./arena";
import { DiagnosisError } from "./errors";
import { requireNonNegative, requirePositive } from "./guards";
import { resolveSettings, type ResolvedSettings } from "./settings";
import { isStrength, weightValue } from "./weights";
import type { NodeLikelihood } from "./likelihood";
import type { DxOption, DxSettings, DxTree } from "./types";

/** Lookups over a tree's nodes and options, without any number checked. */
export interface TreeIndex {
  tree: DxTree;
  nodeIndex: Map<string, number>;
  optionById: Map<string, DxOption>;
  /** Per node, its options in tree order. */
  optionsOf: DxOption[][];
  /** Per node, the options that are outcomes (every option but "don't know"). */
  outcomesOf: DxOption[][];
  /** Option id → its position among its node's outcomes; -1 for "don't know". */
  outcomeIndex: Map<string, number>;
}

/**
 * A tree indexed and checked once per public call. Hypothesis h < K is tree.causes[h];
 * h = K is the unlisted hypothesis when it is enabled.
 */
export interface Model extends TreeIndex {
  settings: ResolvedSettings;
  causeIndex: Map<string, number>;
  K: number;
  H: number;
  hasUnlisted: boolean;
  /** Lazily built per-node likelihoods, see likelihood.ts. */
  matrices: (NodeLikelihood | undefined)[];
  arena: Float64Arena;
}

function indexIds<T extends { id: string }>(items: T[], what: string): Map<string, number> {
  const index = new Map<string, number>();
  items.forEach((item, i) => {
    if (index.has(item.id)) throw new DiagnosisError("duplicate_id", `Two ${what} share the id ${JSON.stringify(item.id)}`);
    index.set(item.id, i);
  });
  return index;
}

export function indexTree(tree: DxTree): TreeIndex {
  const nodeIndex = indexIds(tree.nodes, "nodes");
  indexIds(tree.options, "options");
  const optionsOf: DxOption[][] = tree.nodes.map(() => []);
  const outcomesOf: DxOption[][] = tree.nodes.map(() => []);
  const optionById = new Map<string, DxOption>();
  const outcomeIndex = new Map<string, number>();
  for (const option of tree.options) {
    optionById.set(option.id, option);
    const n = nodeIndex.get(option.nodeId);
    if (n === undefined) continue;
    optionsOf[n].push(option);
    if (option.dontKnow) {
      outcomeIndex.set(option.id, -1);
    } else {
      outcomeIndex.set(option.id, outcomesOf[n].length);
      outcomesOf[n].push(option);
    }
  }
  return { tree, nodeIndex, optionById, optionsOf, outcomesOf, outcomeIndex };
}

export function buildModel(tree: DxTree, settings?: DxSettings): Model {
  const resolved = resolveSettings(settings);
  const index = indexTree(tree);
  const causeIndex = indexIds(tree.causes, "causes");

  for (const node of tree.nodes) {
    const c = node.costMinutes;
    if (c !== undefined && !(typeof c === "number" && c > 0 && c < Infinity)) {
      requirePositive(c, `costMinutes of node ${JSON.stringify(node.id)}`, "bad_cost");
    }
  }
  for (const cause of tree.causes) {
    const w = cause.priorWeight;
    if (!(typeof w === "number" && w >= 0 && w < Infinity)) {
      requireNonNegative(w, `priorWeight of cause ${JSON.stringify(cause.id)}`, "bad_weight");
    }
  }
  // Checked up front, so a bad weight throws whichever nodes a call happens to touch.
  for (const option of tree.options) {
    const evidence = option.evidence;
    const causeIds = Object.keys(evidence ?? {});
    for (let e = 0; e < causeIds.length; e++) {
      const causeId = causeIds[e];
      const w = evidence[causeId];
      if (typeof w === "number" ? w >= 0 && w < Infinity : isStrength(w)) continue;
      weightValue(w, resolved.weights, `evidence of option ${JSON.stringify(option.id)} for ${JSON.stringify(causeId)}`);
    }
  }

  const K = tree.causes.length;
  const hasUnlisted = resolved.unlistedShare > 0;
  if (K === 0 && !hasUnlisted) {
    throw new DiagnosisError("no_hypotheses", "The tree lists no causes and the unlisted hypothesis is disabled");
  }
  return {
    ...index,
    settings: resolved,
    causeIndex,
    K,
    H: K + (hasUnlisted ? 1 : 0),
    hasUnlisted,
    matrices: new Array<NodeLikelihood | undefined>(tree.nodes.length),
    arena: new Float64Arena(),
  };
}

export function nodeAt(model: TreeIndex, nodeId: string): number {
  const n = model.nodeIndex.get(nodeId);
  if (n === undefined) throw new DiagnosisError("unknown_node", `No node with id ${JSON.stringify(nodeId)} in this tree`);
  return n;
}
