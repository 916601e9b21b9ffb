import { describe, expect, it } from "vitest";
import { NODE_HEIGHT, NODE_WIDTH, autoLayout, freeSpot } from "@/lib/trees/layout";
import { treeFileToGraphInput } from "@/lib/trees/file/convert";
import { content } from "../content/load";

describe("automatic layout", () => {
  it("puts every answer's target below the node it leaves, with no two nodes overlapping", () => {
    for (const file of content().trees) {
      const graph = treeFileToGraphInput(file);
      const at = autoLayout(graph);
      expect(at.size, file.slug).toBe(graph.nodes.length);
      for (const o of graph.options) {
        if (o.toKey) expect(at.get(o.toKey)!.y, `${file.slug} ${o.key}`).toBeGreaterThan(at.get(o.fromKey)!.y);
      }
      const boxes = [...at.values()];
      for (let i = 0; i < boxes.length; i++) {
        for (let j = i + 1; j < boxes.length; j++) {
          const overlap = Math.abs(boxes[i].x - boxes[j].x) < NODE_WIDTH && Math.abs(boxes[i].y - boxes[j].y) < NODE_HEIGHT;
          expect(overlap, `${file.slug} nodes ${i} and ${j}`).toBe(false);
        }
      }
    }
  });
});

describe("placing a new node", () => {
  it("takes the wanted spot when it is free and the nearest free one when not", () => {
    const empty = { rootKey: null, causes: [], nodes: [], options: [] };
    expect(freeSpot(empty, { x: 10, y: 20 })).toEqual({ x: 10, y: 20 });
    const one = { ...empty, nodes: [{ key: "a", kind: "question" as const, title: "", prompt: "", costMinutes: 1, needsOpening: false, causeSlug: null, cautionText: "", posX: 0, posY: 0 }] };
    const spot = freeSpot(one, { x: 5, y: 5 });
    expect(Math.abs(spot.x) >= NODE_WIDTH || Math.abs(spot.y) >= NODE_HEIGHT).toBe(true);
    expect(Math.hypot(spot.x, spot.y)).toBeLessThan(NODE_WIDTH + 100);
  });
});
