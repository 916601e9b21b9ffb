import { DiagnosisError } from "./errors";
import { wilsonInterval } from "./statistics";
import type { Interval } from "./types";

export interface CompanionFigures {
  /** The cause the ranking suggests (A). */
  given: string;
  /** The cause confirmed alongside it (B). */
  cause: string;
  /** Closed cases that confirmed both A and B. */
  together: number;
  /** Closed cases that confirmed A. */
  givenCases: number;
  /** Closed cases that confirmed B. */
  causeCases: number;
  /** All closed cases counted. */
  cases: number;
  /** together / givenCases: the share of A's cases that also confirmed B. */
  share: number;
  /** Wilson 95 % score interval of that share. */
  interval: Interval;
  /** causeCases / cases. */
  baseRate: number;
  /** share / baseRate: how much more often B is confirmed when A is. */
  lift: number;
}

/**
 * For every cause B confirmed in at least one closed case together with `given` (A): the
 * conditional share P(B | A) = n(A∧B)/n(A) (the "confidence" of the rule A ⇒ B, Agrawal,
 * Imieliński & Swami 1993) with its Wilson score interval (Wilson 1927), and the lift
 * P(B | A)/P(B) (Brin, Motwani, Ullman & Tsur 1997). Each case is the set of causes confirmed
 * at its bench. Sorted by lift, then share, then cause id.
 */
export function companionFigures(cases: string[][], given: string): CompanionFigures[] {
  if (!Array.isArray(cases) || cases.length === 0) throw new DiagnosisError("empty_input", "Companions need at least one closed case");
  const counts = new Map<string, number>();
  const together = new Map<string, number>();
  let givenCases = 0;
  for (const [i, confirmed] of cases.entries()) {
    if (!Array.isArray(confirmed)) throw new DiagnosisError("empty_input", `Case ${i} must list its confirmed causes`);
    const set = new Set(confirmed);
    const withGiven = set.has(given);
    if (withGiven) givenCases++;
    for (const cause of set) {
      counts.set(cause, (counts.get(cause) ?? 0) + 1);
      if (withGiven && cause !== given) together.set(cause, (together.get(cause) ?? 0) + 1);
    }
  }
  const figures: CompanionFigures[] = [];
  for (const [cause, n] of together) {
    const causeCases = counts.get(cause)!;
    const share = n / givenCases;
    const baseRate = causeCases / cases.length;
    figures.push({
      given,
      cause,
      together: n,
      givenCases,
      causeCases,
      cases: cases.length,
      share,
      interval: wilsonInterval(n, givenCases),
      baseRate,
      lift: share / baseRate,
    });
  }
  return figures.sort((a, b) => b.lift - a.lift || b.share - a.share || (a.cause < b.cause ? -1 : a.cause > b.cause ? 1 : 0));
}
