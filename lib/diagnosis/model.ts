import { Float64Arena } from "./arena";
import { DiagnosisError } from "./errors";
import { requireNonNegative, requirePositive } from "./guards";
import { resolveSettings, type ResolvedSettings } from "./settings";
import { DEFAULT_WEIGHTS, isStrength, weightValue } from "./weights";
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

/** The part of a model that depends on the tree alone: indexes, with every number checked. */
interface CheckedTree extends TreeIndex {
  causeIndex: Map<string, number>;
}

function checkTree(tree: DxTree): CheckedTree {
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
      weightValue(w, DEFAULT_WEIGHTS, `evidence of option ${JSON.stringify(option.id)} for ${JSON.stringify(causeId)}`);
    }
  }
  return { ...index, causeIndex };
}

function modelOf(checked: CheckedTree, resolved: ResolvedSettings): Model {
  const K = checked.tree.causes.length;
  const hasUnlisted = resolved.unlistedShare > 0;
  if (K === 0 && !hasUnlisted) {
    throw new DiagnosisError("no_hypotheses", "The tree lists no causes and the unlisted hypothesis is disabled");
  }
  return {
    ...checked,
    settings: resolved,
    K,
    H: K + (hasUnlisted ? 1 : 0),
    hasUnlisted,
    matrices: new Array<NodeLikelihood | undefined>(checked.tree.nodes.length),
    arena: new Float64Arena(),
  };
}

export function buildModel(tree: DxTree, settings?: DxSettings, cache?: ModelCache): Model {
  if (cache) return cache.model(tree, settings);
  const resolved = resolveSettings(settings);
  return modelOf(checkTree(tree), resolved);
}

const MAX_VARIANTS = 4;

/**
 * Keeps the checked tree and its per-node likelihood matrices between calls, for a tree that
 * never changes (a published version). Building those is most of a call's cost on a large tree;
 * what differs per call (the priors' history and strength, the stop rule) is cheap and applied
 * fresh each time. Matrices depend on the weight table, the learned likelihoods (by identity) and
 * whether the unlisted hypothesis is on, so one cache keeps a few such variants.
 */
export class ModelCache {
  private checked: CheckedTree | null = null;
  private readonly variants = new Map<string, Model>();
  private readonly likelihoodIds = new WeakMap<object, number>();
  private nextLikelihoodId = 1;

  constructor(readonly tree: DxTree) {}

  model(tree: DxTree, settings?: DxSettings): Model {
    if (tree !== this.tree) throw new DiagnosisError("bad_setting", "A model cache serves only the tree it was made for");
    const resolved = resolveSettings(settings);
    const key = this.variantKey(resolved);
    let base = this.variants.get(key);
    if (base) {
      this.variants.delete(key);
    } else {
      base = modelOf((this.checked ??= checkTree(tree)), resolved);
    }
    this.variants.set(key, base); // most recently used last
    while (this.variants.size > MAX_VARIANTS) this.variants.delete(this.variants.keys().next().value as string);
    // Shares the indexes, matrices and arena; carries this call's settings.
    return { ...base, settings: resolved };
  }

  private variantKey(resolved: ResolvedSettings): string {
    const w = resolved.weights;
    let likelihoods = 0;
    if (Object.keys(resolved.likelihoods).length > 0) {
      likelihoods = this.likelihoodIds.get(resolved.likelihoods) ?? this.nextLikelihoodId++;
      this.likelihoodIds.set(resolved.likelihoods, likelihoods);
    }
    return `${w.rules_out}|${w.against}|${w.neutral}|${w.for}|${w.strong}|${likelihoods}|${resolved.unlistedShare > 0 ? 1 : 0}`;
  }
}

export function nodeAt(model: TreeIndex, nodeId: string): number {
  const n = model.nodeIndex.get(nodeId);
  if (n === undefined) throw new DiagnosisError("unknown_node", `No node with id ${JSON.stringify(nodeId)} in this tree`);
  return n;
}
