import { benchPlan, teardownPlan, teardownPlanInOrder, teardownPlanner, type Assembly, type BenchInspection } from "@/lib/diagnosis";
import type { BenchCause, StageInfo } from "./types";

export interface PlanMinutes {
  /** Expected minutes of the teardown plan (bottom-up P-over-C through the stages). */
  teardown: number;
  /** Expected minutes, under the same stages, of the flat p/c order that costs each inspection as if it stood alone. */
  flat: number;
  /** The same for the phone's bench plan: flat p/c over the catalogue's stand-alone inspection minutes. */
  catalogue: number;
}

const assembliesOf = (stages: StageInfo[]): Assembly[] => stages.map((s) => ({ id: s.slug, parent: s.parent, openMinutes: s.openMinutes }));

const inspectionsOf = (causes: BenchCause[]): BenchInspection[] =>
  causes
    .filter((c) => c.prior > 0)
    .map((c) => ({ causeId: c.slug, assemblyId: c.stage, minutes: c.inspectMinutes, probability: c.prior }));

function planInput(stages: StageInfo[], causes: BenchCause[]): { assemblies: Assembly[]; inspections: BenchInspection[] } {
  return { assemblies: assembliesOf(stages), inspections: inspectionsOf(causes) };
}

/**
 * Expected minutes of the teardown plan alone (planMinutes' `teardown`), for reports over many
 * units of one family: the stages are checked once, each unit's causes planned in them.
 */
export function teardownMinutesIn(stages: StageInfo[]): (causes: BenchCause[]) => number {
  const plan = teardownPlanner(assembliesOf(stages));
  return (causes) => plan(inspectionsOf(causes)).expectedMinutes;
}

/**
 * Both plans for one unit from the same probabilities: the flat order ranks by p over the
 * inspection's stand-alone minutes (its own minutes plus opening every stage around it), as the
 * phone's bench plan does; both orders are then costed with each stage opened once.
 */
export function planMinutes(stages: StageInfo[], causes: BenchCause[]): PlanMinutes {
  const { assemblies, inspections } = planInput(stages, causes);
  const bySlug = new Map(stages.map((s) => [s.slug, s]));
  const standAlone = (stage: string) => {
    let minutes = 0;
    for (let s = bySlug.get(stage); s; s = s.parent === null ? undefined : bySlug.get(s.parent)) minutes += s.openMinutes;
    return minutes;
  };
  const flat = benchPlan(inspections.map((x) => ({ id: x.causeId, probability: x.probability, costMinutes: Math.max(x.minutes + standAlone(x.assemblyId), 1e-9) })));
  const byCause = new Map(causes.map((c) => [c.slug, c]));
  const catalogue = benchPlan(inspections.map((x) => ({ id: x.causeId, probability: x.probability, costMinutes: byCause.get(x.causeId)!.catalogueMinutes })));
  return {
    teardown: teardownPlan(assemblies, inspections).expectedMinutes,
    flat: teardownPlanInOrder(assemblies, inspections, flat.order).expectedMinutes,
    catalogue: teardownPlanInOrder(assemblies, inspections, catalogue.order).expectedMinutes,
  };
}

/** The middle value (mean of the two middle ones for an even count); NaN for none. */
export function median(values: number[]): number {
  if (values.length === 0) return Number.NaN;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}
