import "server-only";
import { ModelCache, type DxTree } from "@/lib/diagnosis";
import { AppError } from "@/lib/errors";
import { deepFreeze } from "./deep-freeze";
import { loadGraph, toDxTree } from "@/lib/trees/graph";
import type { GraphNode, GraphOption, TreeGraph } from "@/lib/trees/graph-types";

export interface CaseTree {
  graph: TreeGraph;
  dx: DxTree;
  /** The engine's checked tree and likelihood matrices, reused by every answer on this version. */
  models: ModelCache;
  nodeById: ReadonlyMap<number, GraphNode>;
  nodeByKey: ReadonlyMap<string, GraphNode>;
  optionById: ReadonlyMap<number, GraphOption>;
  optionByKey: ReadonlyMap<string, GraphOption>;
}

const MAX_CACHED = 64;
const globalCache = globalThis as unknown as { rootbenchCaseTrees?: Map<number, Promise<CaseTree>> };
// Published versions are frozen by database triggers, so a cached copy can never go stale.
const cache: Map<number, Promise<CaseTree>> = (globalCache.rootbenchCaseTrees ??= new Map());

function build(graph: TreeGraph, dx: DxTree): CaseTree {
  const frozen = deepFreeze(dx);
  return Object.freeze({
    graph: deepFreeze(graph),
    dx: frozen,
    models: new ModelCache(frozen),
    nodeById: new Map(graph.nodes.map((n) => [n.id, n])),
    nodeByKey: new Map(graph.nodes.map((n) => [n.key, n])),
    optionById: new Map(graph.options.map((o) => [o.id, o])),
    optionByKey: new Map(graph.options.map((o) => [o.key, o])),
  });
}

/** The graph of a published tree version, loaded once per process. Drafts are refused. */
export function publishedTree(versionId: number): Promise<CaseTree> {
  const hit = cache.get(versionId);
  if (hit) {
    cache.delete(versionId);
    cache.set(versionId, hit); // most recently used last
    return hit;
  }
  const loading = (async () => {
    const graph = await loadGraph(versionId);
    if (!graph) throw new AppError("not_found", "That tree version does not exist.");
    if (graph.state !== "published") throw new AppError("invalid", "Cases run only on published tree versions.");
    return build(graph, toDxTree(graph));
  })();
  cache.set(versionId, loading);
  loading.catch(() => cache.delete(versionId));
  while (cache.size > MAX_CACHED) cache.delete(cache.keys().next().value as number);
  return loading;
}
