import dagre from "@dagrejs/dagre";
import type { DraftGraph } from "./draft";

/** The size the canvas draws a node at; the layout spaces nodes by it. */
export const NODE_WIDTH = 224;
export const NODE_HEIGHT = 84;

/**
 * Top-to-bottom layered layout of the whole graph (dagre). Returns each node's top-left corner,
 * the position the canvas and the database keep.
 */
export function autoLayout(draft: DraftGraph): Map<string, { x: number; y: number }> {
  const g = new dagre.graphlib.Graph({ multigraph: true });
  g.setGraph({ rankdir: "TB", nodesep: 36, ranksep: 72, edgesep: 12, marginx: 0, marginy: 0 });
  g.setDefaultEdgeLabel(() => ({}));
  const keys = new Set(draft.nodes.map((n) => n.key));
  for (const node of draft.nodes) g.setNode(node.key, { width: NODE_WIDTH, height: NODE_HEIGHT });
  for (const option of draft.options) {
    if (option.toKey && keys.has(option.fromKey) && keys.has(option.toKey) && option.fromKey !== option.toKey) {
      g.setEdge(option.fromKey, option.toKey, {}, option.key);
    }
  }
  dagre.layout(g);
  const out = new Map<string, { x: number; y: number }>();
  for (const node of draft.nodes) {
    const placed = g.node(node.key);
    out.set(node.key, { x: Math.round(placed.x - NODE_WIDTH / 2), y: Math.round(placed.y - NODE_HEIGHT / 2) });
  }
  return out;
}
