import type { TreeFile, TreeFileNode } from "@/lib/trees/file/schema";
import type { GraphInput } from "@/lib/trees/graph-types";

/** A parsed tree file (our import/export format) as the graph a draft stores. */
export function treeFileToGraphInput(file: TreeFile): GraphInput {
  return {
    rootKey: file.rootKey,
    causes: file.causes.map((c) => ({ slug: c.cause, priorWeight: c.priorWeight })),
    nodes: file.nodes.map((n) => ({
      key: n.key,
      kind: n.kind,
      title: n.title,
      prompt: n.prompt,
      costMinutes: n.kind === "question" || n.kind === "check" ? Math.round(n.costMinutes) || 1 : 1,
      needsOpening: n.kind === "question" || n.kind === "check" ? n.needsOpening : false,
      causeSlug: n.kind === "cause" ? n.cause : null,
      cautionText: n.kind === "caution" ? n.caution : "",
      posX: n.position.x,
      posY: n.position.y,
    })),
    options: file.options.map((o) => ({
      key: o.key, fromKey: o.from, toKey: o.to, label: o.label, dontKnow: o.dontKnow, evidence: { ...o.evidence },
    })),
  };
}

export interface TreeFileMeta {
  slug: string;
  symptom: string;
  title: string;
  description: string;
  scope: string[];
}

/** A stored graph as a tree file (the export format); parsing the result gives the same graph back. */
export function graphToTreeFile(meta: TreeFileMeta, graph: GraphInput): TreeFile {
  return {
    format: "rootbench-tree",
    formatVersion: 1,
    slug: meta.slug,
    symptom: meta.symptom,
    title: meta.title,
    description: meta.description,
    scope: [...meta.scope],
    rootKey: graph.rootKey ?? "",
    causes: graph.causes.map((c) => ({ cause: c.slug, priorWeight: c.priorWeight })),
    nodes: graph.nodes.map((n): TreeFileNode => {
      const base = { key: n.key, title: n.title, prompt: n.prompt, position: { x: n.posX, y: n.posY } };
      switch (n.kind) {
        case "question":
        case "check":
          return { ...base, kind: n.kind, costMinutes: n.costMinutes, needsOpening: n.needsOpening };
        case "cause":
          return { ...base, kind: "cause", cause: n.causeSlug ?? "" };
        case "caution":
          return { ...base, kind: "caution", caution: n.cautionText };
      }
    }),
    options: graph.options.map((o) => ({
      key: o.key, from: o.fromKey, to: o.toKey, label: o.label, dontKnow: o.dontKnow, evidence: { ...o.evidence },
    })),
  };
}
