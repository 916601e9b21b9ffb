import { describe, it, expect } from "vitest";
import { DiagnosisError, walkPath } from "@/lib/diagnosis";
import { answer, workshopTree } from "./fixtures";

// walkPath's rule is our own (documented in lib/diagnosis/path.ts); the tree is invented.
describe("walkPath", () => {
  const tree = workshopTree();

  it("starts at the root with no answers", () => {
    expect(walkPath(tree, [])).toEqual({ visited: ["noise"], current: "noise", cautions: [], reachedCauseIds: [] });
  });

  it("follows chosen options to the next unanswered question", () => {
    expect(walkPath(tree, [answer("noise", "noise-grind")])).toEqual({
      visited: ["noise", "wet"],
      current: "wet",
      cautions: [],
      reachedCauseIds: [],
    });
  });

  it("passes through a caution and stops at a cause", () => {
    const walk = walkPath(tree, [answer("noise", "noise-click"), answer("load", "load-yes")]);
    expect(walk).toEqual({
      visited: ["noise", "load", "stop-riding", "c-clutch"],
      current: null,
      cautions: ["stop-riding"],
      reachedCauseIds: ["clutch-worn"],
    });
  });

  it("a \"don't know\" answer follows its own edge", () => {
    expect(walkPath(tree, [answer("noise", "noise-unsure")]).current).toBe("load");
  });

  it("a jump to a question off the path continues from that question's answer", () => {
    // The path stands at "load"; the technician answers the suggested check "sensor" instead.
    const walk = walkPath(tree, [answer("noise", "noise-click"), answer("sensor", "sensor-off")]);
    expect(walk).toEqual({ visited: ["noise", "sensor", "c-sensor"], current: null, cautions: [], reachedCauseIds: ["sensor-drift"] });
  });

  it("a changed answer re-routes the path from the changed node", () => {
    const walk = walkPath(tree, [answer("noise", "noise-click"), answer("load", "load-yes"), answer("noise", "noise-grind")]);
    expect(walk.current).toBe("wet");
    expect(walk.visited).toEqual(["noise", "load", "stop-riding", "c-clutch", "noise", "wet"]);
    expect(walk.cautions).toEqual(["stop-riding"]); // a caution once shown stays listed
  });

  it("earlier answers further down the path are followed when the walk reaches them", () => {
    const walk = walkPath(tree, [answer("wet", "wet-yes"), answer("noise", "noise-grind")]);
    // "wet" was answered first (a jump from the root), then the root; the walk then passes "wet".
    expect(walk).toEqual({ visited: ["wet", "c-bearing", "noise", "wet", "c-bearing"], current: null, cautions: [], reachedCauseIds: ["bearing-wet"] });
  });

  it("throws for unknown ids and a missing root", () => {
    expect(() => walkPath(tree, [answer("noise", "wet-yes")])).toThrow(DiagnosisError);
    expect(() => walkPath({ ...tree, rootId: "gone" }, [])).toThrow(DiagnosisError);
  });
});
