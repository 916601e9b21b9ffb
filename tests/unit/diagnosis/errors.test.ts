import { describe, it, expect } from "vitest";
import {
  DiagnosisError,
  expectedInformationGain,
  learnLikelihoods,
  rankNextQuestions,
  scoreCauses,
  type DxTree,
} from "@/lib/diagnosis";
import { answer, workshopTree } from "./fixtures";

// Invalid input throws a typed error with a clear message; it never returns NaN.
function codeOf(fn: () => unknown): string {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(DiagnosisError);
    expect((e as DiagnosisError).message.length).toBeGreaterThan(10);
    return (e as DiagnosisError).code;
  }
  throw new Error("expected a DiagnosisError");
}

function withEvidence(value: unknown): DxTree {
  const tree = workshopTree();
  (tree.options.find((o) => o.id === "load-yes")!.evidence as Record<string, unknown>)["clutch-worn"] = value;
  return tree;
}

describe("bad input throws DiagnosisError", () => {
  const tree = workshopTree();

  it("NaN, negative and unknown evidence weights", () => {
    expect(codeOf(() => scoreCauses(withEvidence(Number.NaN), []))).toBe("bad_weight");
    expect(codeOf(() => scoreCauses(withEvidence(-0.5), []))).toBe("bad_weight");
    expect(codeOf(() => scoreCauses(withEvidence(Number.POSITIVE_INFINITY), []))).toBe("bad_weight");
    expect(codeOf(() => rankNextQuestions(withEvidence("very_strong"), []))).toBe("bad_weight");
  });

  it("answers naming unknown nodes or options, or an option of another node", () => {
    expect(codeOf(() => scoreCauses(tree, [answer("nope", "noise-click")]))).toBe("unknown_node");
    expect(codeOf(() => scoreCauses(tree, [answer("noise", "nope")]))).toBe("unknown_option");
    const mismatch = () => scoreCauses(tree, [answer("noise", "wet-yes")]);
    expect(codeOf(mismatch)).toBe("option_node_mismatch");
    expect(() => mismatch()).toThrow(/"wet-yes" belongs to node "wet", not to "noise"/);
    expect(codeOf(() => expectedInformationGain(tree, [], "nope"))).toBe("unknown_node");
    expect(codeOf(() => learnLikelihoods(tree, [{ answers: [answer("noise", "nope")], confirmedCauseId: "clutch-worn" }]))).toBe("unknown_option");
  });

  it("bad settings and numbers", () => {
    expect(codeOf(() => scoreCauses(tree, [], { unlistedShare: 1 }))).toBe("bad_setting");
    expect(codeOf(() => scoreCauses(tree, [], { priorStrength: -1 }))).toBe("bad_setting");
    expect(codeOf(() => scoreCauses(tree, [], { history: { "clutch-worn": Number.NaN } }))).toBe("bad_setting");
    expect(codeOf(() => scoreCauses(tree, [], { weights: { for: -3 } }))).toBe("bad_setting");
    expect(codeOf(() => scoreCauses(tree, [answer("load", "load-yes")], { likelihoods: { "load-yes": { "clutch-worn": 1.5 } } }))).toBe("bad_setting");
    expect(codeOf(() => scoreCauses({ ...tree, causes: [{ id: "x", priorWeight: -1 }] }, []))).toBe("bad_weight");
    const costly = workshopTree();
    costly.nodes.find((n) => n.id === "sensor")!.costMinutes = Number.NaN;
    expect(codeOf(() => rankNextQuestions(costly, []))).toBe("bad_cost");
  });

  it("duplicate ids, no hypotheses, everything ruled out", () => {
    expect(codeOf(() => scoreCauses({ ...tree, nodes: [...tree.nodes, tree.nodes[0]] }, []))).toBe("duplicate_id");
    expect(codeOf(() => scoreCauses({ ...tree, causes: [] }, [], { unlistedShare: 0 }))).toBe("no_hypotheses");
    // "noise-none" rules out clutch-worn; "sensor-ok" rules out sensor-drift; bearing-wet is left.
    const bearingOut = workshopTree();
    bearingOut.options.find((o) => o.id === "noise-none")!.evidence["bearing-wet"] = "rules_out";
    const answers = [answer("noise", "noise-none"), answer("sensor", "sensor-ok")];
    expect(codeOf(() => scoreCauses(bearingOut, answers, { unlistedShare: 0 }))).toBe("all_ruled_out");
    expect(scoreCauses(bearingOut, answers).unlisted).toBe(1); // with the default share the unlisted hypothesis remains
  });
});
