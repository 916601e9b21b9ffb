import { isNonNegativeNumber } from "./guards";
import { graphProblems } from "./validate-graph";
import { weightProblem, weightTable } from "./weights";
import type { DxNode, DxOption, DxSettings, DxTree, TreeProblem } from "./types";

const q = (id: string) => JSON.stringify(id);
const asksSomething = (node: DxNode) => node.kind === "question" || node.kind === "check";

/**
 * Every problem that should block publishing, each naming its node and, where it concerns
 * one, its option. Codes: no_root, cycle, unreachable, too_few_options, dangling_edge,
 * cause_unlinked, evidence_unknown_cause, always_ruled_out, plus bad_weight, bad_cost and
 * duplicate_id for values the scoring functions would refuse.
 */
export function validateTree(tree: DxTree, settings?: Pick<DxSettings, "weights">): TreeProblem[] {
  const weights = weightTable(settings?.weights);
  const causeIds = new Set(tree.causes.map((c) => c.id));
  const problems: TreeProblem[] = [...duplicateProblems(tree), ...graphProblems(tree)];

  const optionsOf = new Map<string, DxOption[]>();
  for (const option of tree.options) {
    const list = optionsOf.get(option.nodeId) ?? [];
    list.push(option);
    optionsOf.set(option.nodeId, list);

    for (const [causeId, w] of Object.entries(option.evidence ?? {})) {
      const where = { nodeId: option.nodeId, optionId: option.id };
      if (!causeIds.has(causeId)) {
        problems.push({ code: "evidence_unknown_cause", ...where, message: `Option ${q(option.id)} of node ${q(option.nodeId)} gives evidence for cause ${q(causeId)}, which is not among this tree's causes` });
      }
      const bad = weightProblem(w);
      if (bad) problems.push({ code: "bad_weight", ...where, message: `Option ${q(option.id)} of node ${q(option.nodeId)}, evidence for ${q(causeId)}: ${bad}` });
    }
  }

  for (const node of tree.nodes) {
    if (node.costMinutes !== undefined && !(isNonNegativeNumber(node.costMinutes) && node.costMinutes > 0)) {
      problems.push({ code: "bad_cost", nodeId: node.id, message: `Node ${q(node.id)} has cost ${String(node.costMinutes)} minutes; it must be a number above 0` });
    }
    if (node.kind === "cause" && (node.causeId === undefined || !causeIds.has(node.causeId))) {
      const detail = node.causeId === undefined ? "links no cause" : `links cause ${q(node.causeId)}, which is not among this tree's causes`;
      problems.push({ code: "cause_unlinked", nodeId: node.id, message: `Cause node ${q(node.id)} ${detail}` });
    }
    if (!asksSomething(node)) continue;

    const outcomes = (optionsOf.get(node.id) ?? []).filter((o) => !o.dontKnow);
    if (outcomes.length < 2) {
      problems.push({ code: "too_few_options", nodeId: node.id, message: `${node.kind === "check" ? "Check" : "Question"} ${q(node.id)} has ${outcomes.length} answer option(s) besides "don't know"; it needs at least 2` });
    }
    for (const causeId of causeIds) {
      const rulesOut = (o: DxOption) => {
        const evidence = o.evidence ?? {};
        const w = Object.hasOwn(evidence, causeId) ? evidence[causeId] : undefined;
        return w !== undefined && weightProblem(w) === null && (typeof w === "number" ? w : weights[w]) === 0;
      };
      if (outcomes.length > 0 && outcomes.every(rulesOut)) {
        problems.push({ code: "always_ruled_out", nodeId: node.id, message: `Every answer to node ${q(node.id)} rules out cause ${q(causeId)}; scoring treats the node as neutral for it` });
      }
    }
  }

  for (const cause of tree.causes) {
    if (!isNonNegativeNumber(cause.priorWeight)) {
      problems.push({ code: "bad_weight", message: `Cause ${q(cause.id)} has prior weight ${String(cause.priorWeight)}; it must be a number ≥ 0` });
    }
    if (cause.inspectMinutes !== undefined && !(isNonNegativeNumber(cause.inspectMinutes) && cause.inspectMinutes > 0)) {
      problems.push({ code: "bad_cost", message: `Cause ${q(cause.id)} has inspection time ${String(cause.inspectMinutes)} minutes; it must be a number above 0` });
    }
  }
  return problems;
}

function duplicateProblems(tree: DxTree): TreeProblem[] {
  const problems: TreeProblem[] = [];
  const check = (ids: string[], what: string, field: "nodeId" | "optionId" | null) => {
    const seen = new Set<string>();
    for (const id of ids) {
      if (seen.has(id)) {
        problems.push({ code: "duplicate_id", ...(field ? { [field]: id } : {}), message: `Two ${what} share the id ${q(id)}` });
      }
      seen.add(id);
    }
  };
  check(tree.nodes.map((n) => n.id), "nodes", "nodeId");
  check(tree.options.map((o) => o.id), "options", "optionId");
  check(tree.causes.map((c) => c.id), "causes", null);
  return problems;
}
