import { describe, expect, it } from "vitest";
import { HISTORY_LIMIT, historyReducer, startHistory, type History } from "@/lib/trees/history";

const add = (n: number) => ({ type: "apply" as const, update: (x: number) => x + n });

describe("undo/redo history", () => {
  it("undoes and redoes steps in order, and a new edit clears what could be redone", () => {
    let h: History<number> = startHistory(0);
    h = historyReducer(h, add(1));
    h = historyReducer(h, add(2));
    expect(h.present).toBe(3);
    h = historyReducer(h, { type: "undo" });
    expect(h.present).toBe(1);
    h = historyReducer(h, { type: "redo" });
    expect(h.present).toBe(3);
    h = historyReducer(h, { type: "undo" });
    h = historyReducer(h, add(10));
    expect([h.present, h.future.length]).toEqual([11, 0]);
  });

  it("folds unrecorded edits (typing) into the step before", () => {
    let h: History<number> = startHistory(0);
    h = historyReducer(h, add(1));
    h = historyReducer(h, { ...add(1), record: false });
    h = historyReducer(h, { ...add(1), record: false });
    expect(h.present).toBe(3);
    h = historyReducer(h, { type: "undo" });
    expect(h.present).toBe(0);
  });

  it("ignores edits that change nothing and undo/redo at either end", () => {
    const h = startHistory({ a: 1 });
    expect(historyReducer(h, { type: "apply", update: (x) => x })).toBe(h);
    expect(historyReducer(h, { type: "undo" })).toBe(h);
    expect(historyReducer(h, { type: "redo" })).toBe(h);
  });

  it("keeps at most HISTORY_LIMIT steps", () => {
    let h: History<number> = startHistory(0);
    for (let i = 0; i < HISTORY_LIMIT + 20; i++) h = historyReducer(h, add(1));
    expect(h.past.length).toBe(HISTORY_LIMIT);
    expect(h.past[0]).toBe(20);
  });

  it("reset starts over from a new present", () => {
    const h = historyReducer(historyReducer(startHistory(0), add(1)), { type: "reset", present: 42 });
    expect(h).toEqual({ past: [], present: 42, future: [] });
  });
});
