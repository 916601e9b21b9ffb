import type { CauseArea } from "@/db/schema";
import type { StoredRanking } from "./ranking-types";
import { percent } from "@/lib/format";

/** Cause areas whose failure means a drive that can slip or jam under the rider. */
export const DRIVE_AREAS: readonly CauseArea[] = ["clutch", "drive_train"];
export const STOP_RIDING_SHARE = 0.4;

export interface ReachedCaution {
  key: string;
  title: string;
  /** A caution placed in front of a check that opens the unit is bench advice, not ride advice. */
  guardsOpening: boolean;
}

export interface RideAdvice {
  stopRiding: boolean;
  driveShare: number;
  reasons: string[];
}

/**
 * The "advise the caller to stop riding" rule: clutch and drive-train causes together at 40 % or
 * more, or any caution node the walk has reached, except cautions that only guard opening the
 * unit at the bench (the standing workshop caution covers those).
 */
export function rideAdvice(
  ranking: Pick<StoredRanking, "causes">,
  areaOf: (causeSlug: string) => CauseArea | undefined,
  cautions: ReachedCaution[],
): RideAdvice {
  let driveShare = 0;
  for (const c of ranking.causes) {
    const area = areaOf(c.causeId);
    if (area && DRIVE_AREAS.includes(area)) driveShare += c.probability;
  }
  const reasons: string[] = [];
  if (driveShare >= STOP_RIDING_SHARE) {
    reasons.push(`clutch and drive-train causes together at ${percent(driveShare)} (the line is ${percent(STOP_RIDING_SHARE)})`);
  }
  for (const c of cautions) if (!c.guardsOpening) reasons.push(`the call reached the caution “${c.title}”`);
  return { stopRiding: reasons.length > 0, driveShare, reasons };
}
