import type { StoredRanking } from "@/lib/triage/ranking-types";
import type { WalkStep } from "@/lib/triage/walk-types";

/** What the walk screen shows: the stored steps, each with the ranking the server returned for it. */
export interface WalkState {
  steps: WalkStep[];
  startRanking: StoredRanking;
}

export function currentRanking(state: WalkState): StoredRanking {
  return state.steps.at(-1)?.ranking ?? state.startRanking;
}
