import { DiagnosisError } from "./errors";
import { requireNonNegative } from "./guards";
import { Z_95 } from "./statistics";

/** One subject's follow-up: `event` false means censored (still event-free) at `time`. */
export interface SurvivalObservation {
  time: number;
  event: boolean;
}

export interface KaplanMeierStep {
  time: number;
  /** Subjects with time ≥ this time; a censoring at the same time as an event is still at risk. */
  atRisk: number;
  events: number;
  /** Censorings from this step's time up to (not including) the next step's time. */
  censored: number;
  /** Product-limit survival just after this time. */
  survival: number;
  /** 95 % pointwise interval from Greenwood's variance on the log(−log S) scale. */
  lower: number;
  upper: number;
}

export interface LogRankResult {
  chiSquare: number;
  pValue: number;
  observedA: number;
  expectedA: number;
  observedB: number;
  expectedB: number;
}

function checked(observations: SurvivalObservation[], what: string): SurvivalObservation[] {
  if (!Array.isArray(observations)) throw new DiagnosisError("empty_input", `${what} must be a list of observations`);
  observations.forEach((o, i) => {
    requireNonNegative(o?.time, `${what}[${i}].time`);
    if (typeof o.event !== "boolean") throw new DiagnosisError("bad_number", `${what}[${i}].event must be true or false`);
  });
  return observations;
}

/** Observations counted by time: how many had the event and how many were censored at `time`. */
export interface SurvivalTally {
  time: number;
  events: number;
  censored: number;
}

/** Distinct times ascending, with the events and censorings at each (rows of the same time are added up). */
export function tallyObservations(observations: SurvivalObservation[]): SurvivalTally[] {
  return merged(observations.map((o) => ({ time: o.time, events: o.event ? 1 : 0, censored: o.event ? 0 : 1 })));
}

function merged(rows: SurvivalTally[]): SurvivalTally[] {
  const byTime = new Map<number, SurvivalTally>();
  for (const r of rows) {
    const row = byTime.get(r.time) ?? { time: r.time, events: 0, censored: 0 };
    row.events += r.events;
    row.censored += r.censored;
    byTime.set(r.time, row);
  }
  return [...byTime.values()].sort((a, b) => a.time - b.time);
}

function checkedTally(rows: SurvivalTally[], what: string): SurvivalTally[] {
  if (!Array.isArray(rows)) throw new DiagnosisError("empty_input", `${what} must be a list of counts`);
  rows.forEach((r, i) => {
    requireNonNegative(r?.time, `${what}[${i}].time`);
    for (const k of ["events", "censored"] as const) {
      if (!Number.isInteger(r[k]) || r[k] < 0) throw new DiagnosisError("bad_count", `${what}[${i}].${k} must be a whole number ≥ 0`);
    }
  });
  return merged(rows);
}

/**
 * Kaplan–Meier product-limit estimate, one step per distinct event time. The interval is
 * S^exp(±z·se) with se = sqrt(Σ d/(n(n−d))) / |log S| (Greenwood on the log(−log) scale), which
 * stays inside [0, 1]; once S reaches 0 the interval is [0, 0].
 */
export function kaplanMeier(observations: SurvivalObservation[]): KaplanMeierStep[] {
  return kaplanMeierOfTally(tallyObservations(checked(observations, "observations")));
}

/** kaplanMeier over observations already counted by time (the same computation, for large groups). */
export function kaplanMeierOfTally(counts: SurvivalTally[]): KaplanMeierStep[] {
  const rows = checkedTally(counts, "counts");
  const steps: KaplanMeierStep[] = [];
  let atRisk = rows.reduce((n, r) => n + r.events + r.censored, 0);
  let survival = 1;
  let greenwood = 0;
  for (const row of rows) {
    if (row.events > 0) {
      survival *= 1 - row.events / atRisk;
      greenwood += row.events < atRisk ? row.events / (atRisk * (atRisk - row.events)) : Infinity;
      const { lower, upper } = logLogInterval(survival, greenwood);
      steps.push({ time: row.time, atRisk, events: row.events, censored: 0, survival, lower, upper });
    }
    const last = steps.at(-1);
    if (last) last.censored += row.censored;
    atRisk -= row.events + row.censored;
  }
  return steps;
}

function logLogInterval(survival: number, greenwood: number): { lower: number; upper: number } {
  if (survival <= 0 || !Number.isFinite(greenwood)) return { lower: 0, upper: 0 };
  if (survival >= 1) return { lower: 1, upper: 1 };
  const se = Math.sqrt(greenwood) / Math.abs(Math.log(survival));
  return { lower: survival ** Math.exp(Z_95 * se), upper: survival ** Math.exp(-Z_95 * se) };
}

/**
 * Two-group log-rank (Mantel–Cox) test: at each distinct event time the expected events of A are
 * d·nA/n with hypergeometric variance d·(nA/n)(nB/n)(n−d)/(n−1); chiSquare = (O_A − E_A)² / V on
 * one degree of freedom. With no events, or no variance, there is nothing to test: chiSquare 0, p 1.
 */
export function logRank(a: SurvivalObservation[], b: SurvivalObservation[]): LogRankResult {
  return logRankOfTally(tallyObservations(checked(a, "a")), tallyObservations(checked(b, "b")));
}

/** logRank over observations already counted by time (the same computation, for large groups). */
export function logRankOfTally(countsA: SurvivalTally[], countsB: SurvivalTally[]): LogRankResult {
  const rowsA = checkedTally(countsA, "a");
  const rowsB = checkedTally(countsB, "b");
  const times = [...new Set([...rowsA, ...rowsB].filter((r) => r.events > 0).map((r) => r.time))].sort((x, y) => x - y);
  const size = (rows: SurvivalTally[]) => rows.reduce((n, r) => n + r.events + r.censored, 0);
  let nA = size(rowsA);
  let nB = size(rowsB);
  let iA = 0;
  let iB = 0;
  let observedA = 0;
  let observedB = 0;
  let expectedA = 0;
  let variance = 0;
  for (const t of times) {
    // Leave the risk sets of everyone who left before t.
    while (iA < rowsA.length && rowsA[iA].time < t) nA -= rowsA[iA].events + rowsA[iA++].censored;
    while (iB < rowsB.length && rowsB[iB].time < t) nB -= rowsB[iB].events + rowsB[iB++].censored;
    const dA = rowsA[iA]?.time === t ? rowsA[iA].events : 0;
    const dB = rowsB[iB]?.time === t ? rowsB[iB].events : 0;
    const n = nA + nB;
    const d = dA + dB;
    observedA += dA;
    observedB += dB;
    expectedA += (d * nA) / n;
    if (n > 1) variance += (d * (nA / n) * (nB / n) * (n - d)) / (n - 1);
  }
  const deaths = observedA + observedB;
  const chiSquare = variance > 0 ? (observedA - expectedA) ** 2 / variance : 0;
  return { chiSquare, pValue: chiSquareSurvival1(chiSquare), observedA, expectedA, observedB, expectedB: deaths - expectedA };
}

/**
 * P(X ≥ x) for chi-square with one degree of freedom: the regularised upper incomplete gamma
 * Q(1/2, x/2), by its series below a + 1 and Lentz's continued fraction above (Press et al.,
 * Numerical Recipes, §6.2).
 */
export function chiSquareSurvival1(x: number): number {
  if (!(x > 0)) return 1;
  const a = 0.5;
  const z = x / 2;
  const logPrefix = -z + a * Math.log(z) - 0.5 * Math.log(Math.PI); // ln Γ(1/2) = ln √π
  if (z < a + 1) {
    let term = 1 / a;
    let sum = term;
    for (let k = 1; k < 500; k++) {
      term *= z / (a + k);
      sum += term;
      if (Math.abs(term) < Math.abs(sum) * 1e-16) break;
    }
    return Math.max(0, 1 - sum * Math.exp(logPrefix));
  }
  const tiny = 1e-300;
  let b = z + 1 - a;
  let c = 1 / tiny;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < 500; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < tiny) d = tiny;
    c = b + an / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return Math.exp(logPrefix) * h;
}
