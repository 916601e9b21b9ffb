import { describe, it, expect } from "vitest";
import { expectedInformationGain, rankNextQuestions } from "@/lib/diagnosis";
import { answer, buildTree, question, workshopTree } from "./fixtures";

// The next-question ranking rules; the tree is invented demo data.
describe("rankNextQuestions", () => {
  const tree = workshopTree();

  it("ranks every reachable question and check, not causes or cautions", () => {
    const ranked = rankNextQuestions(tree, []);
    expect(ranked.map((r) => r.nodeId).sort()).toEqual(["load", "noise", "sensor", "wet"]);
    for (const r of ranked) {
      expect(r.gainBits).toBeCloseTo(expectedInformationGain(tree, [], r.nodeId), 12); // same quantity
    }
    for (let i = 1; i < ranked.length; i++) expect(ranked[i - 1].gainPerMinute).toBeGreaterThanOrEqual(ranked[i].gainPerMinute);
  });

  it("divides by the check's cost; questions cost 1 minute", () => {
    const sensor = rankNextQuestions(tree, []).find((r) => r.nodeId === "sensor")!;
    expect(sensor.gainPerMinute).toBeCloseTo(sensor.gainBits / 10, 12); // IG per minute of cost
  });

  it("keeps only nodes reachable along the chosen edges", () => {
    const ranked = rankNextQuestions(tree, [answer("noise", "noise-grind")]);
    expect(ranked.map((r) => r.nodeId)).toEqual(["wet"]); // edges that agree with the answers
  });

  it("a node answered \"don't know\" is not suggested again", () => {
    // The "don't know" edge leads to "load"; the other branches are no longer on the path.
    const ranked = rankNextQuestions(tree, [answer("noise", "noise-unsure")]);
    expect(ranked.map((r) => r.nodeId)).toEqual(["load"]);
  });

  it("names the causes each node separates, most probable first", () => {
    const ranked = rankNextQuestions(tree, []);
    // Priors 3:2:1 (clutch, bearing, sensor); "noise" moves all three, the check only the sensor.
    expect(ranked.find((r) => r.nodeId === "noise")!.separates).toEqual(["clutch-worn", "bearing-wet", "sensor-drift"]);
    expect(ranked.find((r) => r.nodeId === "sensor")!.separates).toEqual(["sensor-drift"]);
  });

  it("breaks ties by gain, then tree order", () => {
    const twin = (id: string, to: string | null) =>
      question(id, [
        { id: `${id}-a`, to, evidence: { x: "strong" } },
        { id: `${id}-b`, to, evidence: { y: "strong" } },
      ]);
    const twins = buildTree({ causes: { x: 1, y: 1 }, nodes: [twin("first", "second"), twin("second", null)] });
    expect(rankNextQuestions(twins, []).map((r) => r.nodeId)).toEqual(["first", "second"]);
  });

  it("a question that moves nothing gains nothing", () => {
    const flat = buildTree({ causes: { x: 1, y: 1 }, nodes: [question("q", [{ id: "q-1" }, { id: "q-2" }])] });
    expect(rankNextQuestions(flat, [])).toEqual([{ nodeId: "q", gainBits: 0, gainPerMinute: 0, separates: [] }]); // definition: independent outcome
  });
});
