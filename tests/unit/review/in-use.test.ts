import { describe, expect, it } from "vitest";
import { ENOUGH_HISTORY, likelihoodsInUse } from "@/lib/review/in-use";

describe("which likelihoods a tree scores with", () => {
  it("left to decide: authored below the history threshold, learned from it on, each with the reason", () => {
    expect(likelihoodsInUse("auto", 0)).toEqual({ source: "authored", why: `The published version has 0 closed cases; learned likelihoods are used by default from ${ENOUGH_HISTORY}.` });
    expect(likelihoodsInUse("auto", ENOUGH_HISTORY - 1).source).toBe("authored");
    const learned = likelihoodsInUse("auto", ENOUGH_HISTORY);
    expect(learned.source).toBe("learned");
    expect(learned.why).toContain(`${ENOUGH_HISTORY} closed cases, enough`);
  });

  it("a senior's pin wins whatever the history", () => {
    expect(likelihoodsInUse("authored", 5000)).toMatchObject({ source: "authored", why: expect.stringContaining("pinned") });
    expect(likelihoodsInUse("learned", 3)).toMatchObject({ source: "learned" });
  });
});
