import "server-only";
import { adviceFrom, type AdviceSummary } from "./advice";
import { compareUpgrades, talliesByKey } from "./compare";
import { followUps, type RidingUse } from "./follow-ups";
import { DEFAULT_FOLLOW_UP_MONTHS } from "./filter";
import { monthsBefore } from "@/lib/reports/period";

/**
 * Upgrade advice for a unit of this family and riding use, from the shop's repairs of the same
 * family and use; when that is too few to compare any upgrade, from the family's repairs of every use.
 */
export async function upgradeAdviceFor(family: { id: number; name: string }, ridingUse: RidingUse, asOf = new Date()): Promise<AdviceSummary> {
  const today = new Date(Date.UTC(asOf.getUTCFullYear(), asOf.getUTCMonth(), asOf.getUTCDate()));
  const base = { from: monthsBefore(today, DEFAULT_FOLLOW_UP_MONTHS), to: asOf, familyId: family.id, asOf };
  const narrow = compareUpgrades(talliesByKey(await followUps({ ...base, ridingUse })));
  if (narrow.some((c) => c.verdict.kind !== "too_few")) return adviceFrom(narrow, `${family.name} units used for ${ridingUse} riding that we repaired`);
  return adviceFrom(compareUpgrades(talliesByKey(await followUps({ ...base, ridingUse: null }))), `${family.name} units that we repaired (all riding uses)`);
}
