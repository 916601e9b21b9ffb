import type { BenchCause, StageInfo } from "./types";

export interface CauseCatalogue {
  causes: { id: number; slug: string; name: string; inspectMinutes: number; labourMinutes: number; active: boolean }[];
  partsOf: Map<number, { id: number; quantity: number }[]>;
}

export interface CauseLocation {
  causeId: number;
  stage: string;
  inspectMinutes: number;
}

const FALLBACK_ROOT: StageInfo = { slug: "unit", name: "Unit as received", parent: null, openMinutes: 0, closeMinutes: 0, caution: "none" };

/** What a family's bench plans start from: its stages, and the causes to inspect after any triage. */
export interface FamilyBench {
  stages: StageInfo[];
  /**
   * Every active cause located in the unit plus any other cause the final ranking lists (in the
   * unit as received, at its stand-alone inspection minutes), each with its probability at the end
   * of triage (0 where the ranking leaves it out, or for no ranking).
   */
  causesAfter(finalRanking: Record<string, number> | null): BenchCause[];
}

/** A family's {@link FamilyBench}. A family nobody has described yet still gets a plan: everything in the unit as received. */
export function familyBench(stored: StageInfo[], catalogue: CauseCatalogue, located: CauseLocation[]): FamilyBench {
  const stages = stored.length ? stored : [FALLBACK_ROOT];
  const root = stages.find((s) => s.parent === null)!;
  const known = new Set(stages.map((s) => s.slug));
  const where = new Map(located.map((l) => [l.causeId, l]));
  const placed = catalogue.causes.map((c) => {
    const loc = where.get(c.id);
    return { c, loc, stage: loc && known.has(loc.stage) ? loc.stage : root.slug, listedUnranked: loc !== undefined && c.active };
  });
  return {
    stages,
    causesAfter(finalRanking) {
      const causes: BenchCause[] = [];
      for (const { c, loc, stage, listedUnranked } of placed) {
        const prior = finalRanking?.[c.slug] ?? 0;
        if (!listedUnranked && prior === 0) continue;
        causes.push({
          id: c.id, slug: c.slug, name: c.name, stage, inspectMinutes: loc?.inspectMinutes ?? c.inspectMinutes, catalogueMinutes: c.inspectMinutes,
          labourMinutes: c.labourMinutes, prior, parts: catalogue.partsOf.get(c.id) ?? [],
        });
      }
      return causes;
    },
  };
}
