import { DiagnosisError } from "./errors";
import type { TreeIndex } from "./model";
import type { DxAnswer } from "./types";

export interface ResolvedAnswer {
  answer: DxAnswer;
  node: number;
  /** Position among the node's outcomes; -1 for "don't know". */
  outcome: number;
}

/** Checks one answer against the tree and returns its node index and outcome position. */
export function resolveAnswer(model: TreeIndex, answer: DxAnswer): ResolvedAnswer {
  const node = model.nodeIndex.get(answer?.nodeId);
  if (node === undefined) {
    throw new DiagnosisError("unknown_node", `Answer names node ${JSON.stringify(answer?.nodeId)}, which is not in this tree`);
  }
  const option = model.optionById.get(answer.optionId);
  if (option === undefined) {
    throw new DiagnosisError("unknown_option", `Answer names option ${JSON.stringify(answer.optionId)}, which is not in this tree`);
  }
  if (option.nodeId !== answer.nodeId) {
    throw new DiagnosisError(
      "option_node_mismatch",
      `Option ${JSON.stringify(option.id)} belongs to node ${JSON.stringify(option.nodeId)}, not to ${JSON.stringify(answer.nodeId)}`,
    );
  }
  return { answer, node, outcome: model.outcomeIndex.get(option.id) ?? -1 };
}

/**
 * Validates every answer, then keeps the last answer given for each node (a changed answer
 * replaces the earlier one), ordered by where that last answer stands in the list.
 */
export function effectiveAnswers(model: TreeIndex, answers: DxAnswer[]): ResolvedAnswer[] {
  if (!Array.isArray(answers)) throw new DiagnosisError("empty_input", "answers must be an array");
  const resolved = answers.map((a) => resolveAnswer(model, a));
  const lastAt = new Map<number, number>();
  resolved.forEach((r, i) => lastAt.set(r.node, i));
  return resolved.filter((r, i) => lastAt.get(r.node) === i);
}
