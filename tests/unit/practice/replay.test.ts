import { describe, expect, it } from "vitest";
import { rankingAfter, type DxAnswer } from "@/lib/diagnosis";
import { buildReplay } from "@/lib/practice/replay";
import { toDxTree } from "@/lib/trees/graph";
import type { GraphNode, GraphOption, TreeGraph } from "@/lib/trees/graph-types";

const node = (id: number, key: string, kind: GraphNode["kind"], extra: Partial<GraphNode> = {}): GraphNode => ({
  id, key, kind, title: `${key} title`, prompt: "", costMinutes: 1, needsOpening: false, causeSlug: null, cautionText: "", posX: 0, posY: 0, ...extra,
});
const option = (id: number, key: string, fromKey: string, toKey: string | null, label: string, evidence: GraphOption["evidence"] = {}, dontKnow = false): GraphOption => ({
  id, key, fromKey, toKey, label, dontKnow, sortOrder: id, evidence,
});

// An invented three-question tree: slipping under load, with a caution after the first answer.
const graph: TreeGraph = {
  versionId: 1, treeId: 1, number: 1, state: "published", rootKey: "q1", revision: 1,
  causes: [
    { causeId: 1, slug: "clutch", name: "Clutch worn", priorWeight: 1, inspectMinutes: 20 },
    { causeId: 2, slug: "belt", name: "Belt worn", priorWeight: 1, inspectMinutes: 10 },
  ],
  nodes: [
    node(1, "q1", "question"),
    node(2, "warn", "caution", { cautionText: "Stop riding until the unit is checked." }),
    node(3, "q2", "question"),
    node(4, "c1", "check", { costMinutes: 10 }),
    node(5, "end", "cause", { causeSlug: "clutch" }),
  ],
  options: [
    option(11, "q1-yes", "q1", "warn", "yes, under load", { clutch: "strong" }),
    option(12, "q1-no", "q1", "q2", "no", { clutch: "against" }),
    option(21, "warn-go", "warn", "q2", "continue"),
    option(31, "q2-dk", "q2", "c1", "don't know", {}, true),
    option(32, "q2-no", "q2", "c1", "no", { belt: "rules_out" }),
    option(41, "c1-slip", "c1", "end", "slips", { belt: "rules_out" }),
    option(42, "c1-ok", "c1", "end", "holds"),
  ],
};
const facts = { caseId: 7, family: "Invented Gen 1", symptom: "pedals slip", treeTitle: "Pedal slip", ridingUse: "trail", callerKind: "rider" };

// Each step carries the ranking the engine gave after it, as a case step stores it.
const dx = toDxTree(graph);
function recorded(steps: [number, number, string, string][]) {
  const answers: DxAnswer[] = [];
  return steps.map(([nodeId, optionId, nodeKey, optionKey]) => {
    answers.push({ nodeId: nodeKey, optionId: optionKey });
    return { nodeId, optionId, ranking: rankingAfter(dx, answers) };
  });
}

describe("replaying a recorded walk", () => {
  const walk = recorded([[1, 11, "q1", "q1-yes"], [3, 31, "q2", "q2-dk"], [4, 41, "c1", "c1-slip"]]);
  const replay = buildReplay(facts, graph, walk, rankingAfter(dx, []));

  it("lists each answered question or check with its answer, in order", () => {
    expect(replay.steps.map((s) => [s.seq, s.kind, s.title, s.answer, s.dontKnow])).toEqual([
      [1, "question", "q1 title", "yes, under load", false],
      [2, "question", "q2 title", "don't know", true],
      [3, "check", "c1 title", "slips", false],
    ]);
  });

  it("shows a caution when the walk first passes it", () => {
    expect(replay.openingCautions).toEqual([]);
    expect(replay.steps.map((s) => s.cautions)).toEqual([["Stop riding until the unit is checked."], [], []]);
  });

  it("shows the starting ranking, then the ranking each step stored", () => {
    const stored = [rankingAfter(dx, []), ...walk.map((s) => s.ranking)];
    expect(replay.rankings).toHaveLength(4);
    replay.rankings.forEach((r, i) => {
      expect(r.causes.map((c) => [c.slug, c.probability])).toEqual(stored[i].causes.map((c) => [c.causeId, c.probability]));
      expect(r.unlisted).toBe(stored[i].unlisted);
    });
    // A "don't know" answer carries no evidence, so the ranking stays as it was.
    expect(replay.rankings[2]).toEqual(replay.rankings[1]);
    const last = replay.rankings[3];
    expect(last.causes[0].slug).toBe("clutch");
    expect(last.causes.find((c) => c.slug === "belt")).toMatchObject({ probability: 0, ruledOutBy: "c1 title: “slips”" });
  });

  it("offers the tree's causes, by name, as the choices", () => {
    expect(replay.choices).toEqual([{ slug: "belt", name: "Belt worn" }, { slug: "clutch", name: "Clutch worn" }]);
  });

  it("skips steps that do not belong to the tree version", () => {
    const start = rankingAfter(dx, []);
    const steps = [{ nodeId: 99, optionId: 11, ranking: start }, { nodeId: 1, optionId: 12, ranking: rankingAfter(dx, [{ nodeId: "q1", optionId: "q1-no" }]) }];
    expect(buildReplay(facts, graph, steps, start).steps.map((s) => s.answer)).toEqual(["no"]);
  });
});
