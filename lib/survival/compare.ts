import { kaplanMeierOfTally, logRankOfTally, type KaplanMeierStep, type SurvivalTally } from "@/lib/diagnosis";
import type { FollowUpCount } from "./follow-ups";
import { groupLabel, type CauseGroup } from "./groups";
import { UPGRADES, type Upgrade } from "./upgrades";
import { percent } from "@/lib/format";

export const DAYS_PER_MONTH = 30.44;
export const CHECKPOINT_MONTHS = [3, 6, 12] as const;
export const AT_RISK_MONTHS = [0, 3, 6, 9, 12, 18, 24] as const;
/** Below these the page says the data cannot tell yet, rather than printing a verdict. */
export const MIN_REPAIRS_PER_ARM = 20;
export const MIN_RETURNS = 5;
/** A survival figure at a checkpoint needs this many units still followed there. */
export const MIN_AT_RISK = 10;
export const ALPHA = 0.05;

export interface Checkpoint {
  months: number;
  atRisk: number;
  /** Share still not back for this group's faults; null when fewer than MIN_AT_RISK are still followed. */
  survival: number | null;
  lower: number | null;
  upper: number | null;
}

export interface Arm {
  n: number;
  returns: number;
  steps: KaplanMeierStep[];
  checkpoints: Checkpoint[];
  atRisk: { months: number; n: number }[];
  /** The longest follow-up, in days: the curve is drawn up to here. */
  followedDays: number;
}

export type Verdict =
  | { kind: "too_few"; text: string }
  | { kind: "better" | "worse" | "no_difference"; text: string; months: number };

export interface UpgradeComparison {
  upgrade: Upgrade;
  group: CauseGroup;
  fitted: Arm;
  notFitted: Arm;
  pValue: number | null;
  verdict: Verdict;
}

/** Follow-ups counted by day, as the engine takes them. */
export function tallyOf(rows: { days: number; event: boolean; n: number }[]): SurvivalTally[] {
  return rows.map(tallyRow);
}

function tallyRow(r: { days: number; event: boolean; n: number }): SurvivalTally {
  return { time: r.days, events: r.event ? r.n : 0, censored: r.event ? 0 : r.n };
}

/** The follow-up rows of each kind and key ("group:clutch", "fitted:uprated-clutch"), as tallies, in one pass. */
export function talliesByKey(rows: FollowUpCount[]): Map<string, SurvivalTally[]> {
  const out = new Map<string, SurvivalTally[]>();
  for (const r of rows) {
    const key = `${r.kind}:${r.key}`;
    let list = out.get(key);
    if (!list) out.set(key, (list = []));
    list.push(tallyRow(r));
  }
  return out;
}

/** `all` minus `part`, day by day: the repairs of a group that did not have an upgrade fitted. */
export function without(all: SurvivalTally[], part: SurvivalTally[]): SurvivalTally[] {
  const left = new Map<number, { events: number; censored: number }>();
  const add = (r: SurvivalTally, sign: number) => {
    const day = left.get(r.time) ?? { events: 0, censored: 0 };
    day.events += sign * r.events;
    day.censored += sign * r.censored;
    left.set(r.time, day);
  };
  for (const r of all) add(r, 1);
  for (const r of part) add(r, -1);
  return [...left].filter(([, d]) => d.events > 0 || d.censored > 0).map(([time, d]) => ({ time, events: d.events, censored: d.censored }));
}

/** S(t) of a step function: the last step at or before t, 1 before the first. */
export function survivalAt(steps: KaplanMeierStep[], days: number): { survival: number; lower: number; upper: number } {
  let at = { survival: 1, lower: 1, upper: 1 };
  for (const s of steps) {
    if (s.time > days) break;
    at = s;
  }
  return at;
}

export function arm(tally: SurvivalTally[]): Arm {
  const steps = kaplanMeierOfTally(tally);
  // One pass: the units still followed at each month of AT_RISK_MONTHS (which holds 0 and every checkpoint), the returns, the longest follow-up.
  const followed = AT_RISK_MONTHS.map(() => 0);
  let returns = 0;
  let followedDays = 0;
  for (const r of tally) {
    AT_RISK_MONTHS.forEach((months, i) => {
      if (r.time >= months * DAYS_PER_MONTH) followed[i] += r.events + r.censored;
    });
    returns += r.events;
    followedDays = Math.max(followedDays, r.time);
  }
  const followedAt = (months: (typeof AT_RISK_MONTHS)[number]) => followed[AT_RISK_MONTHS.indexOf(months)];
  return {
    n: followedAt(0),
    returns,
    steps,
    checkpoints: CHECKPOINT_MONTHS.map((months) => {
      const atRisk = followedAt(months);
      if (atRisk < MIN_AT_RISK) return { months, atRisk, survival: null, lower: null, upper: null };
      const s = survivalAt(steps, months * DAYS_PER_MONTH);
      return { months, atRisk, survival: s.survival, lower: s.lower, upper: s.upper };
    }),
    atRisk: AT_RISK_MONTHS.map((months, i) => ({ months, n: followed[i] })),
    followedDays,
  };
}

export const formatP = (p: number) => (p < 0.001 ? "p < 0.001" : `p = ${p.toFixed(p < 0.01 ? 3 : 2)}`);

/** What the record supports, in words; says "too early" rather than guess. */
export function verdictFor(upgrade: Upgrade, fitted: Arm, notFitted: Arm, pValue: number | null): Verdict {
  const group = groupLabel(upgrade.guards);
  const counts = `n = ${fitted.n} with, ${notFitted.n} without`;
  const returns = fitted.returns + notFitted.returns;
  if (fitted.n + notFitted.n === 0) return { kind: "too_few", text: `No repairs of ${group} faults in this selection yet.` };
  if (fitted.n < MIN_REPAIRS_PER_ARM || notFitted.n < MIN_REPAIRS_PER_ARM || returns < MIN_RETURNS || pValue === null) {
    return {
      kind: "too_few",
      text: `Too early to tell: ${counts}, ${returns} back for ${group} faults so far. The shop needs at least ${MIN_REPAIRS_PER_ARM} repairs each way and ${MIN_RETURNS} returns before comparing.`,
    };
  }
  // The latest checkpoint where both arms still have enough units followed.
  const months = [...CHECKPOINT_MONTHS].reverse().find((m) => {
    const a = fitted.checkpoints.find((c) => c.months === m)!;
    const b = notFitted.checkpoints.find((c) => c.months === m)!;
    return a.survival !== null && b.survival !== null;
  });
  if (months === undefined) {
    return { kind: "too_few", text: `Too early to tell: fewer than ${MIN_AT_RISK} units each way have been followed for 3 months yet (${counts}).` };
  }
  const a = fitted.checkpoints.find((c) => c.months === months)!.survival!;
  const b = notFitted.checkpoints.find((c) => c.months === months)!.survival!;
  const figures = `${percent(1 - a)} with vs ${percent(1 - b)} without by ${months} months (${formatP(pValue)}; ${counts})`;
  if (pValue >= ALPHA) {
    return { kind: "no_difference", months, text: `No difference shown: units with ${upgrade.phrase} came back for ${group} faults at ${figures}. The record does not show that it helps.` };
  }
  const kind = a > b ? "better" : "worse";
  return { kind, months, text: `Units with ${upgrade.phrase} came back for ${group} faults ${kind === "better" ? "less" : "more"} often: ${figures}.` };
}

/** Fitted vs not fitted, for every upgrade, among the repairs of the cause group it guards (tallies from `talliesByKey`). */
export function compareUpgrades(tallies: Map<string, SurvivalTally[]>): UpgradeComparison[] {
  return UPGRADES.map((upgrade) => {
    const withIt = tallies.get(`fitted:${upgrade.slug}`) ?? [];
    const withoutIt = without(tallies.get(`group:${upgrade.guards}`) ?? [], withIt);
    const fitted = arm(withIt);
    const notFitted = arm(withoutIt);
    const pValue = fitted.n > 0 && notFitted.n > 0 && fitted.returns + notFitted.returns > 0 ? logRankOfTally(withIt, withoutIt).pValue : null;
    return { upgrade, group: upgrade.guards, fitted, notFitted, pValue, verdict: verdictFor(upgrade, fitted, notFitted, pValue) };
  });
}
