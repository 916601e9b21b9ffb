import type { NodeKind, StrengthName } from "@/db/schema";

/**
 * A tree version's graph as the app handles it. Inside the engine (lib/diagnosis) nodes and
 * options are known by their keys and causes by their catalogue slugs, so graphs of different
 * versions of one tree can be compared and learned from.
 */
export interface GraphCause {
  causeId: number;
  slug: string;
  name: string;
  priorWeight: number;
  inspectMinutes: number;
}

export interface GraphNode {
  id: number;
  key: string;
  kind: NodeKind;
  title: string;
  prompt: string;
  costMinutes: number;
  needsOpening: boolean;
  causeSlug: string | null;
  cautionText: string;
  posX: number;
  posY: number;
}

export interface GraphOption {
  id: number;
  key: string;
  fromKey: string;
  toKey: string | null;
  label: string;
  dontKnow: boolean;
  sortOrder: number;
  evidence: Record<string, StrengthName>;
}

export interface TreeGraph {
  versionId: number;
  treeId: number;
  number: number;
  state: "draft" | "published";
  rootKey: string | null;
  revision: number;
  causes: GraphCause[];
  nodes: GraphNode[];
  options: GraphOption[];
}

/** What a save or an import writes: the same graph without database ids. */
export interface GraphInput {
  rootKey: string | null;
  causes: { slug: string; priorWeight: number }[];
  nodes: Omit<GraphNode, "id">[];
  options: Omit<GraphOption, "id" | "sortOrder">[];
}
