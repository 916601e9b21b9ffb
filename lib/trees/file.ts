import type { TreeFile } from "@/lib/content/tree-file";
import type { GraphInput } from "./graph-types";

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
