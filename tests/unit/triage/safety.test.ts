import { describe, expect, it } from "vitest";
import type { CauseArea } from "@/db/schema";
import { rideAdvice } from "@/lib/triage/safety";

const areas: Record<string, CauseArea> = { clutch1: "clutch", gear1: "drive_train", board1: "electronics" };
const areaOf = (slug: string) => areas[slug];
const ranking = (ps: Record<string, number>) => ({ causes: Object.entries(ps).map(([causeId, probability]) => ({ causeId, probability, ruledOutBy: null })) });

// Our rule: common practice is to warn the caller (no published source); the 40 % line is the shop's choice.
describe("advise the caller to stop riding", () => {
  it("when clutch and drive-train causes together reach 40 %", () => {
    const at = rideAdvice(ranking({ clutch1: 0.25, gear1: 0.15, board1: 0.55 }), areaOf, []);
    expect(at.stopRiding).toBe(true);
    expect(at.driveShare).toBeCloseTo(0.4, 12);
    expect(at.reasons).toEqual(["clutch and drive-train causes together at 40\u00a0% (the line is 40\u00a0%)"]);
    expect(rideAdvice(ranking({ clutch1: 0.25, gear1: 0.14, board1: 0.56 }), areaOf, []).stopRiding).toBe(false);
  });

  it("when the walk reached a caution node, unless that caution only guards opening the unit", () => {
    const low = ranking({ board1: 0.9 });
    expect(rideAdvice(low, areaOf, [{ key: "c1", title: "Surging assist", guardsOpening: false }]).reasons)
      .toEqual(["the call reached the caution “Surging assist”"]);
    expect(rideAdvice(low, areaOf, [{ key: "c2", title: "Before opening the unit", guardsOpening: true }]).stopRiding).toBe(false);
  });
});
