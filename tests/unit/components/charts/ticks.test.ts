import { describe, expect, it } from "vitest";
import { percentTick, percentValue, spacedLabels, wholeTicks } from "@/components/charts/ticks";
import { pct } from "@/lib/format";

describe("spacedLabels", () => {
  it("keeps every label when they fit", () => {
    expect(spacedLabels(["a", "b", "c"], 12)).toEqual(["a", "b", "c"]);
  });
  it("keeps every second of 24 months when 12 fit, starting with the first", () => {
    const months = Array.from({ length: 24 }, (_, i) => `m${i}`);
    const kept = spacedLabels(months, 12);
    expect(kept).toHaveLength(12);
    expect(kept.slice(0, 3)).toEqual(["m0", "m2", "m4"]);
  });
  it("keeps every third of 25 when 12 fit", () => {
    expect(spacedLabels(Array.from({ length: 25 }, (_, i) => i), 12)).toEqual([0, 3, 6, 9, 12, 15, 18, 21, 24]);
  });
});

describe("wholeTicks", () => {
  it("counts by ones up to a small maximum", () => {
    expect(wholeTicks(3)).toEqual([0, 1, 2, 3]);
  });
  it("never gives a fractional tick and reaches past the maximum", () => {
    expect(wholeTicks(23)).toEqual([0, 5, 10, 15, 20, 25]);
    expect(wholeTicks(2.4)).toEqual([0, 1, 2, 3]);
  });
  it("gives an axis from 0 to 1 when every count is zero", () => {
    expect(wholeTicks(0)).toEqual([0, 1]);
  });
});

describe("percent-scale values", () => {
  it("write a 0–100 value as the shared formatter writes the share", () => {
    expect(percentValue(12.5)).toBe(pct(0.125));
    expect(percentValue(40, 0)).toBe(pct(0.4, 0));
    expect(percentTick(20)).toBe(pct(0.2, 0));
    expect(percentTick(20)).not.toContain(".");
  });
});
