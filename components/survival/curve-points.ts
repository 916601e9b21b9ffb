import { DAYS_PER_MONTH, type Arm } from "@/lib/survival/compare";
import type { CurvePoint } from "./survival-chart";

/** A Kaplan–Meier arm as chart points: 1 at time 0, one point per step, held to the longest follow-up. */
export function curvePoints(arm: Arm, months: number): CurvePoint[] {
  const points: CurvePoint[] = [{ t: 0, s: 1, band: [1, 1] }];
  for (const s of arm.steps) points.push({ t: s.time / DAYS_PER_MONTH, s: s.survival, band: [s.lower, s.upper] });
  const end = Math.min(months, arm.followedDays / DAYS_PER_MONTH);
  const last = points.at(-1)!;
  if (arm.n > 0 && end > last.t) points.push({ ...last, t: end });
  return points;
}
