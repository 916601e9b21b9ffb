import type { UpgradeComparison } from "./compare";
import { groupLabel } from "./groups";
import type { Upgrade } from "./upgrades";
import { percent } from "@/lib/format";

export interface UpgradeAdvice {
  upgrade: Upgrade;
  /** "supported": the record shows fewer returns with it; "not_shown": enough data, no difference; "too_few": cannot tell yet. */
  kind: "supported" | "not_shown" | "too_few";
  text: string;
  /** For the caller, in plain words; only for supported upgrades. */
  callerText: string | null;
}

export interface AdviceSummary {
  /** Which repairs the figures come from, in words ("Tessel Gen 2 units ridden on trails that we repaired"). */
  basis: string;
  items: UpgradeAdvice[];
}


/**
 * What the shop's own record says about each upgrade for one family and riding use. Only a
 * log-rank difference in favour of the upgrade is "supported"; a difference against it is reported
 * as not shown to help (never as a reason to fit it), and too little data says so.
 */
export function adviceFrom(comparisons: UpgradeComparison[], basis: string): AdviceSummary {
  return {
    basis,
    items: comparisons.map((c) => {
      const { verdict, fitted, notFitted, upgrade } = c;
      if (verdict.kind === "too_few") return { upgrade, kind: "too_few", text: verdict.text, callerText: null };
      if (verdict.kind !== "better") return { upgrade, kind: "not_shown", text: verdict.text, callerText: null };
      const a = fitted.checkpoints.find((p) => p.months === verdict.months)!.survival;
      const b = notFitted.checkpoints.find((p) => p.months === verdict.months)!.survival;
      return {
        upgrade, kind: "supported", text: verdict.text,
        callerText: `Of the ${basis}, those fitted with ${upgrade.phrase} came back with a ${groupLabel(upgrade.guards)} fault less often: ` +
          `${percent(1 - (a ?? 1))} against ${percent(1 - (b ?? 1))} within ${verdict.months} months (${fitted.n} and ${notFitted.n} repairs). We can fit it while the unit is open; ask us for the price.`,
      };
    }),
  };
}
