import type { DxTree } from "@/lib/diagnosis";
import type { GraphInput, TreeGraph } from "./graph-types";

/** The engine's view of a graph: keys for nodes and options, slugs for causes. */
export function toDxTree(graph: Pick<TreeGraph, "rootKey" | "causes" | "nodes" | "options">): DxTree {
  return {
    rootId: graph.rootKey ?? "",
    nodes: graph.nodes.map((n) => ({
      id: n.key, kind: n.kind, ...(n.causeSlug ? { causeId: n.causeSlug } : {}), costMinutes: n.costMinutes,
    })),
    options: graph.options.map((o) => ({
      id: o.key, nodeId: o.fromKey, to: o.toKey, label: o.label, dontKnow: o.dontKnow, evidence: { ...o.evidence },
    })),
    causes: graph.causes.map((c) => ({ id: c.slug, priorWeight: c.priorWeight, inspectMinutes: c.inspectMinutes })),
  };
}

/** A draft graph (no database ids) as the engine sees it; inspection minutes come from the catalogue. */
export function draftToDxTree(draft: GraphInput, inspectMinutesOf: ReadonlyMap<string, number>): DxTree {
  return toDxTree({
    rootKey: draft.rootKey,
    nodes: draft.nodes.map((n) => ({ ...n, id: 0 })),
    options: draft.options.map((o, i) => ({ ...o, id: 0, sortOrder: i })),
    causes: draft.causes.map((c) => ({
      causeId: 0, slug: c.slug, name: c.slug, priorWeight: c.priorWeight, inspectMinutes: inspectMinutesOf.get(c.slug) ?? 15,
    })),
  });
}
