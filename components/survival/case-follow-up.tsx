import Link from "next/link";
import { Panel } from "@/components/ui/panel";
import type { CaseStatus } from "@/db/schema";
import { formatDay } from "@/lib/format";
import { upgradeAdviceFor } from "@/lib/survival/advice-query";
import type { RidingUse } from "@/lib/survival/follow-ups";
import { warrantyReturnOf } from "@/lib/survival/warranty";
import { UpgradeAdviceList } from "./upgrade-advice-list";

/**
 * On the case page: whether this visit is within the warranty of an earlier repair, and, while the
 * unit is booked in or on the bench, what the shop's record says about upgrades for its family and use.
 */
export async function CaseFollowUp({ kase }: { kase: { id: number; status: CaseStatus; familyId: number; familyLabel: string; ridingUse: RidingUse } }) {
  const showAdvice = kase.status === "booked_in" || kase.status === "on_bench";
  const [warranty, advice] = await Promise.all([
    warrantyReturnOf(kase.id),
    showAdvice ? upgradeAdviceFor({ id: kase.familyId, name: kase.familyLabel }, kase.ridingUse) : null,
  ]);
  return (
    <>
      {warranty ? (
        <p role="note" data-testid="warranty-note" className="rounded-md border border-amber bg-amber-light p-3 text-sm text-amber">
          Warranty return: this unit was repaired under <Link href={`/cases/${warranty.repairId}`} className="font-mono">{warranty.repairReference}</Link>,
          closed {formatDay(warranty.repairClosedAt)}, {warranty.days} days before this visit (within the {warranty.months}-month warranty).
        </p>
      ) : null}
      {advice ? (
        <Panel title="Upgrades: what the shop's record says">
          <UpgradeAdviceList advice={advice} />
        </Panel>
      ) : null}
    </>
  );
}
