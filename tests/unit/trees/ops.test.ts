import { describe, expect, it } from "vitest";
import {
  addCauses, addNode, addOption, moveNodes, moveOption, removeCause, removeNodes, setEvidence, setRoot,
} from "@/lib/trees/ops";
import { smallTree } from "./fixtures";

describe("draft edits", () => {
  it("a new node gets a free key and becomes the start of an empty tree", () => {
    const empty = { rootKey: null, causes: [], nodes: [], options: [] };
    const first = addNode(empty, "question", { x: 10.4, y: 20.6 });
    expect(first.key).toBe("q-1");
    expect(first.draft.rootKey).toBe("q-1");
    expect(first.draft.nodes[0]).toMatchObject({ posX: 10, posY: 21, costMinutes: 1 });
    const second = addNode(first.draft, "question", { x: 0, y: 0 });
    expect(second.key).toBe("q-2");
    expect(second.draft.rootKey).toBe("q-1");
    expect(addNode(empty, "check", { x: 0, y: 0 }).draft.nodes[0].costMinutes).toBe(5);
  });

  it("deleting a node drops its answers; answers that led to it now lead nowhere", () => {
    const t = removeNodes(smallTree(), ["c-belt"]);
    expect(t.nodes.map((n) => n.key)).toEqual(["q", "c-gear"]);
    expect(t.options.find((o) => o.key === "q-yes")?.toKey).toBeNull();
    const rootless = removeNodes(smallTree(), ["q"]);
    expect([rootless.rootKey, rootless.options.length]).toEqual([null, 0]);
  });

  it("adds answers next to their siblings and refuses answers from cause nodes", () => {
    const t = addOption(smallTree(), "q", null);
    expect(t.draft.options.map((o) => o.key)).toEqual(["q-yes", "q-no", t.key]);
    expect(t.draft.options[2]).toMatchObject({ fromKey: "q", label: "Answer 3", toKey: null });
    const refused = addOption(smallTree(), "c-belt", "q");
    expect(refused.key).toBe("");
  });

  it("stores neutral evidence as no entry", () => {
    const t = setEvidence(setEvidence(smallTree(), "q-yes", "belt-worn", "neutral"), "q-yes", "gear-teeth-worn", "rules_out");
    expect(t.options[0].evidence).toEqual({ "gear-teeth-worn": "rules_out" });
  });

  it("moves an answer among its own node's answers only", () => {
    const t = moveOption(smallTree(), "q-no", -1);
    expect(t.options.map((o) => o.key)).toEqual(["q-no", "q-yes"]);
    expect(moveOption(t, "q-no", -1)).toBe(t);
  });

  it("removing a cause also removes the evidence that names it", () => {
    const t = removeCause(smallTree(), "gear-teeth-worn");
    expect(t.causes.map((c) => c.slug)).toEqual(["belt-worn"]);
    expect(t.options.map((o) => o.evidence)).toEqual([{ "belt-worn": "strong" }, { "belt-worn": "against" }]);
    expect(addCauses(t, ["belt-worn", "x", "x"]).causes.map((c) => c.slug)).toEqual(["belt-worn", "x"]);
  });

  it("moving nodes keeps untouched nodes as they were, and setRoot is a no-op for the root", () => {
    const before = smallTree();
    const after = moveNodes(before, new Map([["q", { x: 5, y: 6 }]]));
    expect(after.nodes[0]).toMatchObject({ posX: 5, posY: 6 });
    expect(after.nodes[1]).toBe(before.nodes[1]);
    expect(moveNodes(before, new Map([["q", { x: 0, y: 0 }]]))).toBe(before);
    expect(setRoot(before, "q")).toBe(before);
  });
});
