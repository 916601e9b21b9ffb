import { EmptyState } from "@/components/ui/empty-state";
import { Panel } from "@/components/ui/panel";
import type { PartsDemand } from "@/lib/reports/parts";
import { monthLabels, PARTIAL_MONTH_NOTE, whole } from "@/lib/format";
import { NumberTable } from "./number-table";
import { PartsChart } from "./parts-chart";
import { ScrollRegion } from "@/components/ui/scroll-region";

const CHART_PARTS = 6;

export function PartsSection({ demand, period }: { demand: PartsDemand; period: { fromDay: string; toDay: string } }) {
  if (demand.parts.length === 0) return <Panel title="Parts demand"><EmptyState title="No parts replaced on closed cases in this period." /></Panel>;
  const top = demand.parts.slice(0, CHART_PARTS);
  const labels = monthLabels(demand.months, period.fromDay, period.toDay);
  const partial = [...labels.values()].some((l) => l.endsWith("*"));
  const months = demand.months.map((m) => ({
    month: m, label: labels.get(m) ?? m, ...Object.fromEntries(top.map((p) => [p.slug, demand.byMonth[m]?.[p.slug] ?? 0])),
  }));
  return (
    <Panel title="Parts demand">
      <p className="mb-3 text-sm text-ink-soft">Parts replaced on closed cases, per month, to plan stock. The chart stacks the {top.length} most used; the table lists every part.{partial ? ` ${PARTIAL_MONTH_NOTE}` : ""}</p>
      <div className="grid gap-6 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <PartsChart months={months} parts={top} />
        <ScrollRegion label="Parts replaced, all rows" className="max-h-80 overflow-y-auto">
          <NumberTable
            caption="Parts replaced in the period"
            testId="parts-table"
            rows={demand.parts}
            rowKey={(p) => p.slug}
            columns={[
              { key: "part", label: "Part", cell: (p) => p.name },
              { key: "sku", label: "SKU", cell: (p) => <span className="whitespace-nowrap font-mono text-xs">{p.sku}</span> },
              { key: "total", label: "Total", numeric: true, cell: (p) => whole.format(p.total) },
              { key: "month", label: "Per month", numeric: true, cell: (p) => p.perMonth.toFixed(1) },
            ]}
          />
        </ScrollRegion>
      </div>
      <details className="mt-3">
        <summary className="cursor-pointer text-sm font-medium text-copper-dark">Month by month for the charted parts</summary>
        <div className="mt-2">
          <NumberTable
            caption="Charted parts per month"
            rows={months}
            rowKey={(m) => m.month}
            columns={[
              { key: "m", label: "Month", cell: (m) => m.label },
              ...top.map((p) => ({ key: p.slug, label: p.name, numeric: true, cell: (m: (typeof months)[number]) => String((m as Record<string, unknown>)[p.slug] ?? 0) })),
            ]}
          />
        </div>
      </details>
    </Panel>
  );
}
