import type { DraftGraph, DraftNode, DraftOption } from "@/lib/trees/draft";

export function node(key: string, kind: DraftNode["kind"] = "question", patch: Partial<DraftNode> = {}): DraftNode {
  return {
    key, kind, title: `Title ${key}`, prompt: `Prompt ${key}`, costMinutes: kind === "check" ? 5 : 1, needsOpening: false,
    causeSlug: null, cautionText: kind === "caution" ? "Stop riding." : "", posX: 0, posY: 0, ...patch,
  };
}

export function option(key: string, fromKey: string, toKey: string | null, patch: Partial<DraftOption> = {}): DraftOption {
  return { key, fromKey, toKey, label: `Label ${key}`, dontKnow: false, evidence: {}, ...patch };
}

/** A small valid tree: a question with two answers, each leading to a cause node. */
export function smallTree(): DraftGraph {
  return {
    rootKey: "q",
    causes: [{ slug: "belt-worn", priorWeight: 2 }, { slug: "gear-teeth-worn", priorWeight: 1 }],
    nodes: [
      node("q"),
      node("c-belt", "cause", { causeSlug: "belt-worn" }),
      node("c-gear", "cause", { causeSlug: "gear-teeth-worn" }),
    ],
    options: [
      option("q-yes", "q", "c-belt", { label: "Yes", evidence: { "belt-worn": "strong", "gear-teeth-worn": "against" } }),
      option("q-no", "q", "c-gear", { label: "No", evidence: { "belt-worn": "against", "gear-teeth-worn": "for" } }),
    ],
  };
}

export const CATALOGUE = [
  { slug: "belt-worn", inspectMinutes: 20, active: true },
  { slug: "gear-teeth-worn", inspectMinutes: 30, active: true },
  { slug: "old-cause", inspectMinutes: 10, active: false },
];
