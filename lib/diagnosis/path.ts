import { resolveAnswer } from "./answers";
import { DiagnosisError } from "./errors";
import { indexTree, type TreeIndex } from "./model";
import type { DxAnswer, DxTree, PathWalk } from "./types";

/**
 * The path the triage screen shows. The answers are replayed in order. Before each answer
 * the walk advances from where it stands: through cautions (collected; their first outgoing
 * option is followed) and through nodes answered earlier in the list (their latest chosen
 * option is followed), stopping at the first question/check not yet answered, at a cause
 * node (terminal, collected) or at a dead end (no option, a null or missing target, or a
 * node already passed in this advance). The answer then moves the walk to its chosen
 * option's target, whether or not its node is where the walk stood — a jump to a suggested
 * question, or a changed answer, continues from there. After the last answer the walk
 * advances once more; the unanswered question/check where it stops is `current`, else null.
 * `visited` lists nodes in walk order (skipped questions are left out; a node the walk
 * returns to appears again); cautions and reached causes are listed once each.
 */
export function walkPath(tree: DxTree, answers: DxAnswer[]): PathWalk {
  const model = indexTree(tree);
  if (!model.nodeIndex.has(tree.rootId)) {
    throw new DiagnosisError("no_root", `The tree's root ${JSON.stringify(tree.rootId)} is not one of its nodes`);
  }
  if (!Array.isArray(answers)) throw new DiagnosisError("empty_input", "answers must be an array");

  const walk = new Walk(model);
  let from: string | null = tree.rootId;
  for (const answer of answers) {
    walk.advance(from);
    resolveAnswer(model, answer);
    walk.chosen.set(answer.nodeId, answer.optionId);
    walk.visit(answer.nodeId);
    from = model.optionById.get(answer.optionId)?.to ?? null;
  }
  const stop = walk.advance(from);
  if (stop !== null) walk.visit(stop);
  return { visited: walk.visited, current: stop, cautions: [...walk.cautions], reachedCauseIds: [...walk.causes] };
}

class Walk {
  readonly chosen = new Map<string, string>();
  readonly visited: string[] = [];
  readonly cautions = new Set<string>();
  readonly causes = new Set<string>();

  constructor(private readonly model: TreeIndex) {}

  visit(nodeId: string): void {
    this.visited.push(nodeId);
  }

  /** Walks from `start`; returns the unanswered question/check it stops at, or null. */
  advance(start: string | null): string | null {
    const passed = new Set<string>();
    let at = start;
    while (at !== null && !passed.has(at)) {
      const n = this.model.nodeIndex.get(at);
      if (n === undefined) return null;
      const node = this.model.tree.nodes[n];
      const options = this.model.optionsOf[n];
      passed.add(at);
      if (node.kind === "cause") {
        this.visit(at);
        if (node.causeId !== undefined) this.causes.add(node.causeId);
        return null;
      }
      if (node.kind === "caution") {
        this.visit(at);
        this.cautions.add(at);
        at = options[0]?.to ?? null;
        continue;
      }
      const chosen = this.chosen.get(at);
      if (chosen === undefined) return at;
      this.visit(at);
      at = options.find((o) => o.id === chosen)?.to ?? null;
    }
    return null;
  }
}
