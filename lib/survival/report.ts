import "server-only";
import { kaplanMeierOfTally, type SurvivalTally } from "@/lib/diagnosis";
import { monthsBefore } from "@/lib/reports/period";
import { sql as pg } from "@/db";
import { compareUpgrades, DAYS_PER_MONTH, survivalAt, talliesByKey, type UpgradeComparison } from "./compare";
import type { SurvivalFilter } from "./filter";
import { followUps, type FollowUpScope } from "./follow-ups";
import { CAUSE_GROUPS, type CauseGroup } from "./groups";
import { loadWarrantyMonths } from "./warranty";

export interface GroupWarranty {
  group: CauseGroup;
  repairs: number;
  /** Units back for a fault of the same group within the warranty period. */
  backInWarranty: number;
  /** Kaplan–Meier share back by the end of the warranty period (counts units not followed that long fairly). */
  shareByWarrantyEnd: number;
}

export interface SurvivalReport {
  filter: SurvivalFilter;
  familyName: string | null;
  from: Date;
  asOf: Date;
  warrantyMonths: number;
  comparisons: UpgradeComparison[];
  warranty: GroupWarranty[];
}

export async function followUpScope(filter: SurvivalFilter, asOf = new Date()): Promise<{ scope: FollowUpScope; familyName: string | null }> {
  // An unknown family in a hand-edited URL follows all families rather than none.
  const [family] = filter.familySlug
    ? await pg<{ familyId: number; familyName: string }[]>`
        select id as "familyId", name || case when generation <> '' then ' ' || generation else '' end as "familyName"
        from motor_families where slug = ${filter.familySlug}`
    : [];
  const today = new Date(Date.UTC(asOf.getUTCFullYear(), asOf.getUTCMonth(), asOf.getUTCDate()));
  return {
    scope: { from: monthsBefore(today, filter.months), to: asOf, familyId: family?.familyId ?? null, ridingUse: filter.ridingUse, asOf },
    familyName: family?.familyName ?? null,
  };
}

/** Per cause group (tallies from `talliesByKey`), how many repairs came back within the warranty period. */
export function warrantyByGroup(tallies: Map<string, SurvivalTally[]>, warrantyMonths: number): GroupWarranty[] {
  const limit = warrantyMonths * DAYS_PER_MONTH;
  return CAUSE_GROUPS.map(({ slug }) => {
    const inGroup = tallies.get(`group:${slug}`) ?? [];
    const steps = kaplanMeierOfTally(inGroup);
    return {
      group: slug,
      repairs: inGroup.reduce((a, r) => a + r.events + r.censored, 0),
      backInWarranty: inGroup.filter((r) => r.time <= limit).reduce((a, r) => a + r.events, 0),
      shareByWarrantyEnd: 1 - survivalAt(steps, limit).survival,
    };
  }).filter((g) => g.repairs > 0);
}

/** Everything the "Does it last?" page shows: one grouped query, the curves and tests worked out here. */
export async function loadSurvivalReport(filter: SurvivalFilter, asOf = new Date()): Promise<SurvivalReport> {
  const [{ scope, familyName }, warrantyMonths] = await Promise.all([followUpScope(filter, asOf), loadWarrantyMonths()]);
  const tallies = talliesByKey(await followUps(scope));
  return {
    filter, familyName, from: scope.from, asOf, warrantyMonths,
    comparisons: compareUpgrades(tallies),
    warranty: warrantyByGroup(tallies, warrantyMonths),
  };
}
