import type { UpgradeKind } from "@/db/schema";
import { groupOfArea, type CauseGroup } from "@/lib/survival/groups";
import { UPGRADES } from "@/lib/survival/upgrades";
import type { Cause, Scenario } from "@/db/seed/content";
import { Random } from "@/lib/random";

const DAY = 86_400_000;

/**
 * Invented follow-up behaviour of the demo shop's repairs (no published source; chosen so the
 * "Does it last?" page shows clear benefits and one upgrade with no measurable effect):
 * - the chance a repaired unit is back within a year for the same kind of fault, by cause group;
 * - riding use makes some groups fail sooner (trail is hard on clutches, commuting through winter on seals);
 * - each upgrade multiplies that hazard, per motor family where it matters; sealed screws change nothing.
 */
const RELATED_WITHIN_YEAR: Record<CauseGroup, number> = { clutch: 0.24, sealing: 0.22, gearing: 0.08, electrics: 0.14, other: 0.05 };
const USE_FACTOR: Partial<Record<string, Partial<Record<CauseGroup, number>>>> = {
  trail: { clutch: 1.5, gearing: 1.3 },
  commuting: { sealing: 1.3, electrics: 1.2 },
  cargo: { gearing: 1.4, clutch: 1.2 },
};
const HAZARD_RATIO: Record<UpgradeKind, { default: number; families?: Record<string, number> }> = {
  "uprated-clutch": { default: 0.75, families: { "orvanta-tessel-2": 0.25, "orvanta-kestrum-1": 0.3 } },
  "crank-seal-barrier": { default: 0.7, families: { "pellacor-fennel-1": 0.25, "orvanta-tessel-2": 0.35, "orvanta-kestrum-1": 0.4 } },
  "sealed-bearings": { default: 0.85 },
  "sealed-screws": { default: 1 },
  "conformal-coating": { default: 0.55 },
  "cable-sleeve": { default: 0.75 },
};
/** Share of repairs in the guarded group that get each upgrade fitted. */
const FIT_RATE = 0.45;
const UNRELATED_WITHIN_YEAR = 0.05;

export interface ScheduledReturn {
  at: number;
  serial: string;
  familySlug: string;
  ridingUse: string;
  trueCause: string;
  /** Index of the repaired case in the simulator's output. */
  repairIndex: number;
}

const hazardPerDay = (withinYear: number) => -Math.log(1 - withinYear) / 365;

/** Decides upgrades and return times for the demo repairs, and hands the returns back in date order. */
export class ReturnSchedule {
  private pending: ScheduledReturn[] = [];
  private readonly rng: Random;

  constructor(seed: number, private readonly scenario: Scenario, private readonly causes: Map<string, Cause>, private readonly anchor: Date) {
    this.rng = new Random(seed);
  }

  /** Upgrades fitted to a repair of `causeSlug`: each upgrade guarding its group, independently. */
  fit(causeSlug: string): UpgradeKind[] {
    const cause = this.causes.get(causeSlug);
    if (!cause) return [];
    const group = groupOfArea(cause.area);
    return UPGRADES.filter((u) => u.guards === group && this.rng.chance(FIT_RATE)).map((u) => u.slug);
  }

  /** Draws when (if ever, before the anchor) the repaired unit comes back, and for what. */
  schedule(repair: { index: number; closedAt: Date; serial: string; familySlug: string; ridingUse: string; causeSlug: string; upgrades: UpgradeKind[] }): void {
    const cause = this.causes.get(repair.causeSlug);
    if (!cause) return;
    const group = groupOfArea(cause.area);
    let hazard = hazardPerDay(Math.min(0.95, RELATED_WITHIN_YEAR[group] * (USE_FACTOR[repair.ridingUse]?.[group] ?? 1)));
    for (const u of repair.upgrades) hazard *= HAZARD_RATIO[u].families?.[repair.familySlug] ?? HAZARD_RATIO[u].default;
    const related = this.exponential(hazard);
    const unrelated = this.exponential(hazardPerDay(UNRELATED_WITHIN_YEAR));
    const days = Math.min(related, unrelated);
    const at = repair.closedAt.getTime() + days * DAY;
    if (at >= this.anchor.getTime() - 21 * DAY) return;
    const rates = Object.entries(this.scenario.families[repair.familySlug].causeRates).filter(([slug]) => {
      const c = this.causes.get(slug);
      return c && (groupOfArea(c.area) === group) === (related <= unrelated);
    });
    if (!rates.length) return;
    const trueCause = this.rng.weighted(rates);
    this.pending.push({ at, serial: repair.serial, familySlug: repair.familySlug, ridingUse: repair.ridingUse, trueCause, repairIndex: repair.index });
    this.pending.sort((a, b) => a.at - b.at);
  }

  /** The earliest return due by `t`, taken off the schedule. */
  due(t: number): ScheduledReturn | null {
    return this.pending.length && this.pending[0].at <= t ? this.pending.shift()! : null;
  }

  private exponential(rate: number): number {
    return rate > 0 ? -Math.log(1 - this.rng.next()) / rate : Infinity;
  }
}

/** The outcome's free-text line for structured upgrades, as a technician would write it. */
export function upgradesText(kinds: UpgradeKind[]): string {
  return kinds.map((k) => UPGRADES.find((u) => u.slug === k)!.name).join("; ");
}
