import { RIDING_USES } from "@/db/schema";
import type { RidingUse } from "./follow-ups";

/** The "Does it last?" page's filter as it travels in the URL: `?family=<slug>&use=<riding use>&last=12|24|36`. */
export const FOLLOW_UP_MONTHS = [12, 24, 36] as const;
export const DEFAULT_FOLLOW_UP_MONTHS = 24;

export interface SurvivalFilter {
  familySlug: string | null;
  ridingUse: RidingUse | null;
  months: number;
}

type Params = Record<string, string | string[] | undefined>;
const first = (params: Params, key: string) => (Array.isArray(params[key]) ? params[key][0] : params[key]);

export function parseSurvivalFilter(params: Params): SurvivalFilter {
  const family = first(params, "family");
  const use = first(params, "use");
  const last = Number(first(params, "last"));
  return {
    familySlug: family && /^[a-z0-9-]{1,80}$/.test(family) ? family : null,
    ridingUse: (RIDING_USES as readonly string[]).includes(use ?? "") ? (use as RidingUse) : null,
    months: (FOLLOW_UP_MONTHS as readonly number[]).includes(last) ? last : DEFAULT_FOLLOW_UP_MONTHS,
  };
}
