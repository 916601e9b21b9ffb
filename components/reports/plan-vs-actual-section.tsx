import { Panel } from "@/components/ui/panel";
import type { PlanVsActualRow } from "@/lib/bench/plan-vs-actual";
import { NumberTable } from "./number-table";

const minutes = (m: number) => `${Math.round(m)} min`;

/** Expected teardown minutes of the bench plan against the labour technicians recorded, per family. */
export function PlanVsActualSection({ rows }: { rows: PlanVsActualRow[] }) {
  return (
    <Panel title="Bench plan against recorded labour">
      <p className="mb-3 text-sm text-ink-soft">
        Medians over closed cases: the expected teardown minutes of the plan at the start of the bench (opening each stage once,
        inspecting in the cheapest expected order) and the labour recorded in the outcome, which also holds the repair itself and closing up.
      </p>
      {rows.length ? (
        <NumberTable
          caption="Planned teardown and recorded labour per motor family"
          testId="plan-vs-actual"
          rows={rows}
          rowKey={(r) => String(r.familyId)}
          columns={[
            { key: "family", label: "Motor family", cell: (r) => r.family },
            { key: "cases", label: "Cases", numeric: true, cell: (r) => r.cases },
            { key: "planned", label: "Planned teardown", numeric: true, cell: (r) => minutes(r.planned) },
            { key: "recorded", label: "Recorded labour", numeric: true, cell: (r) => minutes(r.recorded) },
            { key: "share", label: "Teardown share", numeric: true, cell: (r) => (r.recorded > 0 ? `${Math.round((r.planned / r.recorded) * 100)} %` : "—") },
          ]}
        />
      ) : <p className="text-sm text-ink-faint">No closed cases with a ranking and recorded labour in this period.</p>}
    </Panel>
  );
}
