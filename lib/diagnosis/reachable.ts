import type { ResolvedAnswer } from "./answers";
import type { TreeIndex } from "./model";

/**
 * Nodes reachable from the root along edges that agree with the answers: from an answered
 * node only its chosen option's edge, from any other node every edge. Targets that do not
 * exist are skipped (validateTree reports them).
 */
export function reachableFromRoot(model: TreeIndex, answers: ResolvedAnswer[]): Uint8Array {
  const seen = new Uint8Array(model.tree.nodes.length);
  const root = model.nodeIndex.get(model.tree.rootId);
  if (root === undefined) return seen;

  const chosen = new Map<number, string>();
  for (const a of answers) chosen.set(a.node, a.answer.optionId);

  const stack = [root];
  seen[root] = 1;
  while (stack.length > 0) {
    const n = stack.pop() as number;
    const only = chosen.get(n);
    for (const option of model.optionsOf[n]) {
      if (only !== undefined && option.id !== only) continue;
      if (option.to === null) continue;
      const next = model.nodeIndex.get(option.to);
      if (next === undefined || seen[next]) continue;
      seen[next] = 1;
      stack.push(next);
    }
  }
  return seen;
}
