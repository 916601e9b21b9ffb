import { describe, expect, it } from "vitest";
import { diffGraphs, diffSize } from "@/lib/trees/diff";
import type { GraphInput } from "@/lib/trees/graph-types";
import { node, option, smallTree } from "./fixtures";

// Each expectation follows from the edit made to the constructed tree (no published source applies).
describe("diffGraphs", () => {
  it("reports nothing for the same graph, and counts moves without listing them", () => {
    const a = smallTree();
    expect(diffSize(diffGraphs(a, a))).toBe(0);
    const moved = { ...a, nodes: a.nodes.map((n) => (n.key === "q" ? { ...n, posX: 300 } : n)) };
    const d = diffGraphs(a, moved);
    expect(diffSize(d)).toBe(0);
    expect(d.nodesMoved).toBe(1);
  });

  it("lists nodes added, removed and changed field by field", () => {
    const a = smallTree();
    const b = {
      ...a,
      nodes: [
        { ...a.nodes[0], title: "Does the belt skip?", costMinutes: 2 },
        a.nodes[1],
        node("k-open", "check", { title: "Open and look", needsOpening: true }),
      ],
      options: a.options.map((o) => (o.toKey === "c-gear" ? { ...o, toKey: "k-open" } : o)),
    };
    const d = diffGraphs(a, b);
    expect(d.nodesAdded).toEqual([{ key: "k-open", kind: "check", title: "Open and look" }]);
    expect(d.nodesRemoved).toEqual([{ key: "c-gear", kind: "cause", title: "Title c-gear" }]);
    expect(d.nodesChanged).toEqual([{
      key: "q", kind: "question", title: "Does the belt skip?",
      changes: [{ field: "title", before: "Title q", after: "Does the belt skip?" }, { field: "cost (minutes)", before: "1", after: "2" }],
    }]);
    expect(d.optionsChanged).toEqual([{ key: "q-no", fromKey: "q", label: "No", changes: [{ field: "leads to", before: "c-gear", after: "k-open" }] }]);
  });

  it("lists answers added with their evidence, removed answers, and label changes", () => {
    const a = smallTree();
    const b: GraphInput = {
      ...a,
      options: [
        { ...a.options[0], label: "Yes, it skips" },
        option("q-dk", "q", "c-belt", { label: "Don't know", dontKnow: true }),
        option("q-some", "q", null, { label: "Sometimes", evidence: { "belt-worn": "for" } }),
      ],
    };
    const d = diffGraphs(a, b);
    expect(d.optionsAdded.map((o) => [o.key, o.toKey, o.evidence])).toEqual([["q-dk", "c-belt", {}], ["q-some", null, { "belt-worn": "for" }]]);
    expect(d.optionsRemoved).toEqual([{ key: "q-no", fromKey: "q", label: "No" }]);
    expect(d.optionsChanged[0].changes).toEqual([{ field: "label", before: "Yes", after: "Yes, it skips" }]);
  });

  it("treats a missing evidence entry as neutral, so only real strength changes show", () => {
    const a = smallTree();
    const b: GraphInput = {
      ...a,
      options: [
        { ...a.options[0], evidence: { "belt-worn": "strong" as const, "gear-teeth-worn": "rules_out" as const } },
        { ...a.options[1], evidence: { "belt-worn": "against" as const, "gear-teeth-worn": "for" as const, other: "neutral" as const } },
      ],
    };
    expect(diffGraphs(a, b).evidenceChanged).toEqual([
      { optionKey: "q-yes", fromKey: "q", label: "Yes", cause: "gear-teeth-worn", before: "against", after: "rules_out" },
    ]);
    const dropped = { ...a, options: [{ ...a.options[0], evidence: { "belt-worn": "strong" as const } }, a.options[1]] };
    expect(diffGraphs(a, dropped).evidenceChanged.map((e) => [e.cause, e.before, e.after])).toEqual([["gear-teeth-worn", "against", "neutral"]]);
  });

  it("reports causes added and removed, prior weights and the start node", () => {
    const a = smallTree();
    const b = { ...a, rootKey: "c-belt", causes: [{ slug: "belt-worn", priorWeight: 5 }, { slug: "motor-clutch-slip", priorWeight: 1 }] };
    const d = diffGraphs(a, b);
    expect(d.rootChanged).toEqual({ before: "q", after: "c-belt" });
    expect(d.causesAdded).toEqual([{ slug: "motor-clutch-slip", priorWeight: 1 }]);
    expect(d.causesRemoved).toEqual([{ slug: "gear-teeth-worn", priorWeight: 1 }]);
    expect(d.priorsChanged).toEqual([{ slug: "belt-worn", before: 2, after: 5 }]);
    expect(diffSize(d)).toBe(4);
  });

  it("flags a reorder of answers, but not the shift caused by adding or removing one", () => {
    const a = smallTree();
    const swapped = { ...a, options: [a.options[1], a.options[0]] };
    expect(diffGraphs(a, swapped).optionsChanged.map((o) => o.changes)).toEqual([
      [{ field: "place among the answers", before: "2", after: "1" }],
      [{ field: "place among the answers", before: "1", after: "2" }],
    ]);
    const inserted = { ...a, options: [option("q-first", "q", null), ...a.options] };
    expect(diffGraphs(a, inserted).optionsChanged).toEqual([]);
  });

  it("compares against an empty draft as everything added", () => {
    const d = diffGraphs({ rootKey: null, causes: [], nodes: [], options: [] }, smallTree());
    expect([d.nodesAdded.length, d.optionsAdded.length, d.causesAdded.length]).toEqual([3, 2, 2]);
    expect(d.rootChanged).toEqual({ before: null, after: "q" });
  });
});
