import { describe, expect, it } from "vitest";
import { talliesByKey, without } from "@/lib/survival/compare";
import type { FollowUpCount } from "@/lib/survival/follow-ups";

const byTime = <T extends { time: number }>(list: T[]) => [...list].sort((a, b) => a.time - b.time);

describe("follow-up tallies", () => {
  const rows: FollowUpCount[] = [
    { kind: "group", key: "clutch", days: 30, event: true, n: 3 },
    { kind: "group", key: "clutch", days: 30, event: false, n: 2 },
    { kind: "group", key: "clutch", days: 90, event: false, n: 5 },
    { kind: "group", key: "sealing", days: 10, event: true, n: 1 },
    { kind: "fitted", key: "uprated-clutch", days: 30, event: false, n: 2 },
    { kind: "fitted", key: "uprated-clutch", days: 90, event: false, n: 1 },
  ];

  it("are split by kind and key in one pass, events and censorings apart", () => {
    const tallies = talliesByKey(rows);
    expect([...tallies.keys()].sort()).toEqual(["fitted:uprated-clutch", "group:clutch", "group:sealing"]);
    expect(tallies.get("group:clutch")).toEqual([
      { time: 30, events: 3, censored: 0 },
      { time: 30, events: 0, censored: 2 },
      { time: 90, events: 0, censored: 5 },
    ]);
    expect(tallies.get("group:sealing")).toEqual([{ time: 10, events: 1, censored: 0 }]);
  });

  it("without the fitted repairs leaves the group's other repairs, day by day, and drops emptied days", () => {
    const tallies = talliesByKey(rows);
    const rest = without(tallies.get("group:clutch")!, tallies.get("fitted:uprated-clutch")!);
    expect(byTime(rest)).toEqual([
      { time: 30, events: 3, censored: 0 },
      { time: 90, events: 0, censored: 4 },
    ]);
    expect(without(tallies.get("fitted:uprated-clutch")!, tallies.get("fitted:uprated-clutch")!)).toEqual([]);
  });
});
