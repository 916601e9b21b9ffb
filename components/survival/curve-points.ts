import { DAYS_PER_MONTH, type Arm } from "@/lib/survival/compare";
import type { CurvePoint } from "./survival-chart";

// The chart draws months and shares to well under a pixel at these precisions; sending full doubles
// to the browser only makes every page load heavier (a point per step, hundreds per curve).
const month = (t: number) => Math.round(t * 1000) / 1000;
const share = (p: number) => Math.round(p * 10_000) / 10_000;

/** A Kaplan–Meier arm as chart points: 1 at time 0, one point per step, held to the longest follow-up. */
export function curvePoints(arm: Arm, months: number): CurvePoint[] {
  const points: CurvePoint[] = [{ t: 0, s: 1, band: [1, 1] }];
  for (const s of arm.steps) points.push({ t: month(s.time / DAYS_PER_MONTH), s: share(s.survival), band: [share(s.lower), share(s.upper)] });
  const end = Math.min(months, arm.followedDays / DAYS_PER_MONTH);
  const last = points.at(-1)!;
  if (arm.n > 0 && end > last.t) points.push({ ...last, t: month(end) });
  return points;
}
