import { describe, expect, it } from "vitest";
import { familyBench, type CauseCatalogue } from "@/lib/bench/start";
import type { StageInfo } from "@/lib/bench/types";

const stage = (slug: string, parent: string | null, openMinutes: number): StageInfo => ({ slug, name: slug, parent, openMinutes, closeMinutes: openMinutes, caution: "none" });
const STAGES = [stage("unit", null, 0), stage("housing", "unit", 20), stage("gearbox", "housing", 10)];

const catalogue: CauseCatalogue = {
  causes: [
    { id: 1, slug: "clutch", name: "Clutch", inspectMinutes: 30, labourMinutes: 60, active: true },
    { id: 2, slug: "bearing", name: "Bearing", inspectMinutes: 40, labourMinutes: 90, active: true },
    { id: 3, slug: "sensor", name: "Sensor", inspectMinutes: 12, labourMinutes: 45, active: true },
    { id: 4, slug: "retired", name: "Retired", inspectMinutes: 8, labourMinutes: 20, active: false },
  ],
  partsOf: new Map([[1, [{ id: 7, quantity: 1 }]]]),
};
const located = [
  { causeId: 1, stage: "housing", inspectMinutes: 5 },
  { causeId: 2, stage: "gearbox", inspectMinutes: 4 },
  { causeId: 4, stage: "housing", inspectMinutes: 3 },
];

describe("familyBench: what the bench plans of a family's units start from", () => {
  const bench = familyBench(STAGES, catalogue, located);

  it("lists every active located cause, at its stage's minutes, with probability 0 when the ranking leaves it out", () => {
    const causes = bench.causesAfter(null);
    expect(bench.stages).toBe(STAGES);
    expect(causes.map((c) => [c.slug, c.stage, c.inspectMinutes, c.catalogueMinutes, c.prior])).toEqual([
      ["clutch", "housing", 5, 30, 0],
      ["bearing", "gearbox", 4, 40, 0],
    ]);
    expect(causes[0].parts).toEqual([{ id: 7, quantity: 1 }]);
    expect(causes[1].parts).toEqual([]);
  });

  it("adds a ranked cause the family has no location for in the unit as received, at its stand-alone minutes; a ranked retired cause stays", () => {
    const causes = bench.causesAfter({ clutch: 0.5, sensor: 0.2, retired: 0.1, unlisted: 0.2 });
    expect(causes.map((c) => [c.slug, c.stage, c.inspectMinutes, c.prior])).toEqual([
      ["clutch", "housing", 5, 0.5],
      ["bearing", "gearbox", 4, 0],
      ["sensor", "unit", 12, 0.2],
      ["retired", "housing", 3, 0.1],
    ]);
  });

  it("gives each ranking its own list: one case's probabilities never leak into the next", () => {
    expect(bench.causesAfter({ bearing: 0.9 }).find((c) => c.slug === "clutch")!.prior).toBe(0);
    expect(bench.causesAfter({ clutch: 0.4 }).find((c) => c.slug === "bearing")!.prior).toBe(0);
  });

  it("puts a cause located on a stage the family no longer has in the unit as received", () => {
    const causes = familyBench(STAGES, catalogue, [{ causeId: 1, stage: "motor-can", inspectMinutes: 6 }]).causesAfter(null);
    expect(causes.map((c) => [c.slug, c.stage, c.inspectMinutes])).toEqual([["clutch", "unit", 6]]);
  });

  it("plans a family nobody has described yet with everything in the unit as received", () => {
    const undescribed = familyBench([], catalogue, []);
    const causes = undescribed.causesAfter({ sensor: 0.7 });
    expect(undescribed.stages.map((s) => [s.slug, s.parent, s.openMinutes])).toEqual([["unit", null, 0]]);
    expect(causes.map((c) => [c.slug, c.stage, c.inspectMinutes])).toEqual([["sensor", "unit", 12]]);
  });
});
