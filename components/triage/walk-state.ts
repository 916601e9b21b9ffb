import { computeRanking } from "@/lib/triage/ranking";
import type { StoredRanking } from "@/lib/triage/ranking-types";
import { ModelCache, type DxSettings, type DxTree } from "@/lib/diagnosis";
import type { WalkStep } from "@/lib/triage/walk-types";

export interface WalkState {
  steps: WalkStep[];
  startRanking: StoredRanking;
}

export type WalkChange =
  | { type: "answer"; nodeKey: string; optionKey: string }
  | { type: "undo" };

export function currentRanking(state: WalkState): StoredRanking {
  return state.steps.at(-1)?.ranking ?? state.startRanking;
}

/**
 * The optimistic view: the engine runs in the browser on the same tree and settings, so the
 * screen moves at once; the server's ranking replaces this one when it answers.
 */
export function optimisticWalk(tree: DxTree, settings: DxSettings) {
  const models = new ModelCache(tree);
  return (state: WalkState, change: WalkChange): WalkState => {
    if (change.type === "undo") return { ...state, steps: state.steps.slice(0, -1) };
    const answers = [...state.steps, change].map((s) => ({ nodeId: s.nodeKey, optionId: s.optionKey }));
    let ranking: StoredRanking;
    try {
      ranking = computeRanking(tree, answers, settings, models);
    } catch {
      ranking = currentRanking(state);
    }
    const seq = (state.steps.at(-1)?.seq ?? 0) + 1;
    return { ...state, steps: [...state.steps, { id: -seq, seq, nodeKey: change.nodeKey, optionKey: change.optionKey, ranking }] };
  };
}
