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

const GAP_X = 40;
const GAP_Y = 48;

/**
 * The nearest place to `desired` where a new node overlaps none: tried on a grid of node-sized
 * steps, nearest first, so nodes added one after another sit side by side instead of stacking.
 */
export function freeSpot(draft: DraftGraph, desired: { x: number; y: number }): { x: number; y: number } {
  const clear = (x: number, y: number) =>
    draft.nodes.every((n) => Math.abs(n.posX - x) >= NODE_WIDTH + 8 || Math.abs(n.posY - y) >= NODE_HEIGHT + 8);
  const candidates: { x: number; y: number; d: number }[] = [];
  for (let row = -6; row <= 6; row++) {
    for (let col = -6; col <= 6; col++) {
      const x = desired.x + col * (NODE_WIDTH + GAP_X);
      const y = desired.y + row * (NODE_HEIGHT + GAP_Y);
      candidates.push({ x, y, d: Math.hypot(col * 1.2, row) });
    }
  }
  candidates.sort((a, b) => a.d - b.d);
  const spot = candidates.find((c) => clear(c.x, c.y)) ?? candidates[candidates.length - 1];
  return { x: Math.round(spot.x), y: Math.round(spot.y) };
}
