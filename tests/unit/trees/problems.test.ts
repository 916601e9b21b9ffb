import { describe, expect, it } from "vitest";
import { treeProblems } from "@/lib/trees/problems";
import { treeFileToGraphInput } from "@/lib/trees/file/convert";
import { content } from "../content/load";
import { CATALOGUE, node, option, smallTree } from "./fixtures";

const codes = (p: { code: string }[]) => p.map((x) => x.code).sort();

describe("tree problems (what blocks publishing)", () => {
  it("a small complete tree has none", () => {
    expect(treeProblems(smallTree(), CATALOGUE)).toEqual([]);
  });

  it("every demo tree has none against the demo catalogue", () => {
    const { trees, causes } = content();
    const catalogue = causes.map((c) => ({ slug: c.slug, inspectMinutes: c.inspectMinutes, active: true }));
    for (const t of trees) expect(treeProblems(treeFileToGraphInput(t), catalogue), t.slug).toEqual([]);
  });

  it("includes the engine's checks, each naming its node", () => {
    const t = smallTree();
    const oneAnswer = { ...t, options: [t.options[0]] };
    const problems = treeProblems(oneAnswer, CATALOGUE);
    expect(codes(problems)).toEqual(["too_few_options", "unreachable"]);
    expect(problems.find((p) => p.code === "too_few_options")?.nodeId).toBe("q");
    expect(problems.find((p) => p.code === "unreachable")?.nodeId).toBe("c-gear");
  });

  it("flags causes missing from or retired in the catalogue", () => {
    const t = smallTree();
    const withOld = {
      ...t,
      causes: [...t.causes, { slug: "old-cause", priorWeight: 1 }, { slug: "nowhere", priorWeight: 1 }],
      nodes: [...t.nodes, node("c-x", "cause", { causeSlug: "nowhere" })],
      options: [...t.options, option("q-x", "q", "c-x", { label: "Maybe" })],
    };
    expect(codes(treeProblems(withOld, CATALOGUE))).toEqual(["cause_not_in_catalogue", "cause_not_in_catalogue", "cause_retired"]);
  });

  it("flags empty titles, wording, caution text and answer labels", () => {
    const t = smallTree();
    const blank = {
      ...t,
      nodes: [{ ...t.nodes[0], title: " ", prompt: "" }, t.nodes[1], t.nodes[2], node("caution-1", "caution", { cautionText: "" })],
      options: [{ ...t.options[0], label: "" }, t.options[1], option("q-c", "q", "caution-1", { label: "Other" })],
    };
    const problems = treeProblems(blank, CATALOGUE).filter((p) => p.code === "missing_text");
    expect(problems.map((p) => [p.nodeId, p.optionId ?? null])).toEqual([["q", null], ["q", null], ["caution-1", null], ["q", "q-yes"]]);
  });

  it("flags a tree with no causes and a cause node linking none", () => {
    const t = { ...smallTree(), causes: [], options: smallTree().options.map((o) => ({ ...o, evidence: {} })) };
    const problems = treeProblems({ ...t, nodes: t.nodes.map((n) => (n.key === "c-belt" ? { ...n, causeSlug: null } : n)) }, CATALOGUE);
    expect(codes(problems)).toEqual(["cause_unlinked", "cause_unlinked", "no_causes"]);
  });
});
