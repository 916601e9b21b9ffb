import { describe, it, expect } from "vitest";
import { validateTree, type DxTree } from "@/lib/diagnosis";
import { buildTree, causeNode, question, workshopTree } from "./fixtures";

// The tree validation rules and their error codes; each test breaks one.
function edit(change: (tree: DxTree) => void): DxTree {
  const tree = workshopTree();
  change(tree);
  return tree;
}

describe("validateTree", () => {
  it("finds nothing wrong with a sound tree", () => {
    expect(validateTree(workshopTree())).toEqual([]);
  });

  it("no_root", () => {
    const problems = validateTree(edit((t) => (t.rootId = "missing")));
    expect(problems).toEqual([expect.objectContaining({ code: "no_root" })]);
    expect(problems[0].message).toContain('"missing"');
  });

  it("cycle", () => {
    const tree = edit((t) => {
      t.options.find((o) => o.id === "wet-no")!.to = "noise";
    });
    const problem = validateTree(tree).find((p) => p.code === "cycle");
    expect(problem?.nodeId).toBe("noise");
    expect(problem?.message).toBe('Nodes "noise" → "wet" → "noise" form a cycle');
  });

  it("unreachable", () => {
    const tree = edit((t) => t.nodes.push({ id: "orphan", kind: "cause", causeId: "clutch-worn" }));
    expect(validateTree(tree)).toEqual([expect.objectContaining({ code: "unreachable", nodeId: "orphan" })]);
  });

  it("too_few_options counts options that are not \"don't know\"", () => {
    const tree = edit((t) => {
      t.options = t.options.filter((o) => o.id !== "noise-grind" && o.id !== "noise-none");
    });
    const problem = validateTree(tree).find((p) => p.code === "too_few_options");
    expect(problem).toMatchObject({ nodeId: "noise" });
    expect(problem?.message).toContain('"noise"');
  });

  it("dangling_edge, for a missing target and for an option of a missing node", () => {
    const tree = edit((t) => {
      t.options.find((o) => o.id === "load-no")!.to = "nowhere";
      t.options.push({ id: "stray", nodeId: "ghost", to: null, label: "stray", evidence: {} });
    });
    const problems = validateTree(tree).filter((p) => p.code === "dangling_edge");
    expect(problems).toEqual([
      expect.objectContaining({ optionId: "load-no", nodeId: "load" }),
      expect.objectContaining({ optionId: "stray" }),
    ]);
  });

  it("cause_unlinked, without causeId or with one the tree does not list", () => {
    const tree = edit((t) => {
      t.nodes.find((n) => n.id === "c-bearing")!.causeId = "not-listed";
      delete t.nodes.find((n) => n.id === "c-sensor")!.causeId;
    });
    const problems = validateTree(tree).filter((p) => p.code === "cause_unlinked");
    expect(problems.map((p) => p.nodeId)).toEqual(["c-bearing", "c-sensor"]);
  });

  it("evidence_unknown_cause", () => {
    const tree = edit((t) => {
      t.options.find((o) => o.id === "wet-yes")!.evidence["seal-gone"] = "for";
    });
    expect(validateTree(tree)).toEqual([expect.objectContaining({ code: "evidence_unknown_cause", nodeId: "wet", optionId: "wet-yes" })]);
  });

  it("always_ruled_out", () => {
    const tree = buildTree({
      causes: { a: 1, b: 1 },
      nodes: [
        question("q", [
          { id: "q-1", to: "ca", evidence: { b: "rules_out" } },
          { id: "q-2", to: "cb", evidence: { b: 0 } },
          { id: "q-dk", to: "ca", dontKnow: true },
        ]),
        causeNode("ca", "a"),
        causeNode("cb", "b"),
      ],
    });
    const problems = validateTree(tree);
    expect(problems).toEqual([expect.objectContaining({ code: "always_ruled_out", nodeId: "q" })]);
    expect(problems[0].message).toContain('"b"');
  });

  it("bad_weight, bad_cost and duplicate_id for values scoring would refuse", () => {
    const tree = edit((t) => {
      t.options.find((o) => o.id === "load-yes")!.evidence["clutch-worn"] = -1;
      t.options.find((o) => o.id === "wet-yes")!.evidence["bearing-wet"] = Number.NaN;
      t.causes[0].priorWeight = -2;
      t.nodes.find((n) => n.id === "sensor")!.costMinutes = 0;
      t.nodes.push({ id: "c-clutch", kind: "cause", causeId: "clutch-worn" });
    });
    const problems = validateTree(tree);
    expect(problems.filter((p) => p.code === "bad_weight").map((p) => p.optionId ?? null)).toEqual(["load-yes", "wet-yes", null]);
    expect(problems.filter((p) => p.code === "bad_cost").map((p) => p.nodeId)).toEqual(["sensor"]);
    expect(problems.filter((p) => p.code === "duplicate_id").map((p) => p.nodeId)).toEqual(["c-clutch"]);
  });
});
