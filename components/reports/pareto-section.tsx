import { EmptyState } from "@/components/ui/empty-state";
import { Panel } from "@/components/ui/panel";
import type { Pareto } from "@/lib/reports/pareto";
import { interval, pct, whole } from "@/lib/format";
import { NumberTable } from "./number-table";
import { ParetoChart } from "./pareto-chart";
import { ScrollRegion } from "@/components/ui/scroll-region";

const CHART_CAUSES = 15;

export function ParetoSection({ pareto }: { pareto: Pareto }) {
  if (pareto.total === 0) {
    return <Panel title="Confirmed causes"><EmptyState title="No closed cases in this period.">Pick a longer period or another motor family.</EmptyState></Panel>;
  }
  const points = pareto.rows.slice(0, CHART_CAUSES).map((r, i) => ({
    rank: i + 1, name: r.name, n: r.n, share: r.share * 100,
    error: [(r.share - r.low) * 100, (r.high - r.share) * 100] as [number, number], cumulative: r.cumulative * 100,
  }));
  return (
    <Panel title="Confirmed causes">
      <p className="mb-3 text-sm text-ink-soft">
        Primary confirmed cause of {whole.format(pareto.total)} closed case{pareto.total === 1 ? "" : "s"}, most frequent first.
        Whiskers show the 95 % Wilson interval of each share (left axis); the line adds the shares up (right axis).
        {pareto.rows.length > CHART_CAUSES ? ` The chart shows the first ${CHART_CAUSES}; the table has all ${pareto.rows.length}.` : ""}
      </p>
      <div className="grid gap-6 2xl:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <ParetoChart points={points} />
        <ScrollRegion label="Confirmed causes, all rows" className="max-h-96 overflow-y-auto">
          <NumberTable
            caption="Confirmed causes in Pareto order"
            testId="pareto-table"
            rows={pareto.rows}
            rowKey={(r) => r.key}
            columns={[
              { key: "rank", label: "#", numeric: true, cell: (r) => pareto.rows.indexOf(r) + 1 },
              { key: "cause", label: "Cause", cell: (r) => r.name },
              { key: "n", label: "Cases", numeric: true, cell: (r) => whole.format(r.n) },
              { key: "share", label: "Share", numeric: true, cell: (r) => pct(r.share) },
              { key: "ci", label: "95 % interval", numeric: true, cell: (r) => interval(r.low, r.high) },
              { key: "cum", label: "Cumulative", numeric: true, cell: (r) => pct(r.cumulative) },
            ]}
          />
        </ScrollRegion>
      </div>
    </Panel>
  );
}
