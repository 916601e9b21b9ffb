import type { CauseArea } from "@/db/schema";

/**
 * Cause groups for follow-up: a unit back with a confirmed cause in the same group as the cause
 * its repair fixed counts as the repair not lasting. Areas that fail together sit in one group
 * (water past a seal ruins the bearing behind it; a loose lockring and a worn gear are one drive train).
 */
export const CAUSE_GROUPS = [
  { slug: "clutch", label: "clutch", areas: ["clutch"] },
  { slug: "sealing", label: "seal and bearing", areas: ["seal", "bearing"] },
  { slug: "gearing", label: "gearing, belt and housing", areas: ["drive_train", "housing"] },
  { slug: "electrics", label: "electrics and sensor", areas: ["electronics", "cable", "sensor", "firmware"] },
  { slug: "other", label: "other", areas: ["other"] },
] as const satisfies readonly { slug: string; label: string; areas: readonly CauseArea[] }[];

export type CauseGroup = (typeof CAUSE_GROUPS)[number]["slug"];

export function groupOfArea(area: CauseArea): CauseGroup {
  return CAUSE_GROUPS.find((g) => (g.areas as readonly CauseArea[]).includes(area))?.slug ?? "other";
}

export function groupLabel(group: CauseGroup): string {
  return CAUSE_GROUPS.find((g) => g.slug === group)!.label;
}
