import { EmptyState } from "@/components/ui/empty-state";
import type { CaseStatus } from "@/db/schema";

/**
 * Where the bench outcome (confirmed causes, parts, upgrades, labour, photos) goes on the case
 * page. The outcome form is built separately and mounted here; until then this shows the state.
 */
export function BenchOutcomeSlot({ status }: { caseId: number; status: CaseStatus }) {
  if (status === "open") return <EmptyState title="Still in triage.">The bench outcome is recorded once the unit is on the bench.</EmptyState>;
  if (status === "advised") return <EmptyState title="Advised by phone; no unit came in." />;
  return <EmptyState title="No bench outcome recorded yet." />;
}
