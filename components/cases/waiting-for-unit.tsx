import { CaseList } from "@/components/home/case-list";
import { Panel } from "@/components/ui/panel";
import { waitingForUnit } from "@/lib/cases/queries";

/** Home panel for technicians: units booked in by phone that have not reached the bench yet. */
export async function WaitingForUnitPanel() {
  const rows = await waitingForUnit();
  return (
    <Panel title="Waiting for the unit">
      <CaseList items={rows} empty="No booked-in units on their way." />
    </Panel>
  );
}
