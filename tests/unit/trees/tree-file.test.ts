import { describe, expect, it } from "vitest";
import { graphToTreeFile, treeFileToGraphInput } from "@/lib/trees/file/convert";
import { parseTreeFileText } from "@/lib/trees/file/parse";
import { content } from "../content/load";

const demo = () => content().trees.find((t) => t.slug === "pedal-slip")!;
const meta = (f: ReturnType<typeof demo>) => ({ slug: f.slug, symptom: f.symptom, title: f.title, description: f.description, scope: f.scope });

function problemsOf(value: unknown) {
  const r = parseTreeFileText(typeof value === "string" ? value : JSON.stringify(value));
  return r.ok ? [] : r.problems;
}

describe("tree file import checks", () => {
  it("export then import gives the same graph back", () => {
    const file = demo();
    const graph = treeFileToGraphInput(file);
    const exported = graphToTreeFile(meta(file), graph);
    const parsed = parseTreeFileText(JSON.stringify(exported));
    expect(parsed.ok).toBe(true);
    if (parsed.ok) expect(treeFileToGraphInput(parsed.file)).toEqual(graph);
  });

  it("says where a file is not JSON", () => {
    expect(problemsOf("{ nope")[0]).toMatchObject({ path: "" });
    expect(problemsOf("{ nope")[0].message).toMatch(/not valid JSON/);
  });

  it("names each schema problem by its JSON path", () => {
    const file = structuredClone(demo()) as unknown as Record<string, unknown> & { nodes: Record<string, unknown>[]; options: Record<string, unknown>[] };
    file.formatVersion = 2;
    file.nodes[0].title = "";
    file.nodes[1].kind = "wizard";
    file.nodes[2].colour = "red";
    file.options[0].evidence = { "belt-worn": "maybe" };
    const problems = problemsOf(file);
    expect(problems.map((p) => p.path)).toEqual(["formatVersion", "nodes[0].title", "nodes[1].kind", "nodes[2]", "options[0].evidence.belt-worn"]);
    expect(problems[1].message).toBe("must not be empty");
    expect(problems[3].message).toMatch(/colour/);
  });

  it("refuses repeated keys and answers that name missing nodes", () => {
    const file = structuredClone(demo());
    file.nodes.push({ ...file.nodes[2] });
    file.options[0].to = "nowhere";
    file.rootKey = "also-nowhere";
    const problems = problemsOf(file);
    expect(problems.map((p) => p.path)).toEqual([`nodes[${file.nodes.length - 1}]`, "rootKey", "options[0].to"]);
    expect(problems[0].message).toMatch(/nodes\[2\]/);
  });

  it("applies the editor's size limits under the file's field names", () => {
    const file = structuredClone(demo());
    const caution = file.nodes.findIndex((n) => n.kind === "caution");
    const node = file.nodes[caution];
    if (node.kind === "caution") node.caution = "x".repeat(4001);
    expect(problemsOf(file).map((p) => p.path)).toEqual([`nodes[${caution}].caution`]);
  });
});
