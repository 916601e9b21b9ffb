/**
 * Undo/redo over immutable snapshots. Snapshots share unchanged parts (nodes, options), so
 * keeping a hundred of them costs little even for a large tree.
 */
export interface History<T> {
  past: T[];
  present: T;
  future: T[];
}

export const HISTORY_LIMIT = 100;

export type HistoryEvent<T> =
  | { type: "apply"; update: (present: T) => T; record?: boolean }
  | { type: "undo" }
  | { type: "redo" }
  | { type: "reset"; present: T };

export function startHistory<T>(present: T): History<T> {
  return { past: [], present, future: [] };
}

function pushPast<T>(past: T[], item: T): T[] {
  const next = [...past, item];
  return next.length > HISTORY_LIMIT ? next.slice(next.length - HISTORY_LIMIT) : next;
}

/** `apply` makes one undo step, unless record is false (live typing folded into the step before). */
export function historyReducer<T>(state: History<T>, event: HistoryEvent<T>): History<T> {
  switch (event.type) {
    case "apply": {
      const next = event.update(state.present);
      if (next === state.present) return state;
      if (event.record === false) return { ...state, present: next };
      return { past: pushPast(state.past, state.present), present: next, future: [] };
    }
    case "undo": {
      if (state.past.length === 0) return state;
      const previous = state.past[state.past.length - 1];
      return { past: state.past.slice(0, -1), present: previous, future: [state.present, ...state.future] };
    }
    case "redo": {
      if (state.future.length === 0) return state;
      const [next, ...rest] = state.future;
      return { past: pushPast(state.past, state.present), present: next, future: rest };
    }
    case "reset":
      return startHistory(event.present);
  }
}
