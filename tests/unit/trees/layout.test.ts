import { describe, expect, it } from "vitest";
import { NODE_HEIGHT, NODE_WIDTH, autoLayout } from "@/lib/trees/layout";
import { treeFileToGraphInput } from "@/lib/trees/file";
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
