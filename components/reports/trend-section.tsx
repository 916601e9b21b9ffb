import { EmptyState } from "@/components/ui/empty-state";
import { Panel } from "@/components/ui/panel";
import { TREND_REST, type CauseTrend } from "@/lib/reports/trend";
import { monthLabels, PARTIAL_MONTH_NOTE } from "@/lib/format";
import { NumberTable } from "./number-table";
import { TrendChart } from "./trend-chart";

export function TrendSection({ trend, period }: { trend: CauseTrend; period: { fromDay: string; toDay: string } }) {
  if (trend.series.length === 0) return <Panel title="Causes month by month"><EmptyState title="No closed cases in this period." /></Panel>;
  type Row = { month: string; label: string } & Record<string, number | string>;
  const labels = monthLabels(trend.months.map((m) => m.month), period.fromDay, period.toDay);
  const months: Row[] = trend.months.map((m) => ({ ...m, label: labels.get(m.month) ?? m.month }));
  const partial = [...labels.values()].some((l) => l.endsWith("*"));
  return (
    <Panel title="Causes month by month">
      <p className="mb-3 text-sm text-ink-soft">
        Closed cases per month for the five most frequent causes of the period. Every other cause together is in the table (as a line it would dwarf the five).{partial ? ` ${PARTIAL_MONTH_NOTE}` : ""}
      </p>
      <TrendChart months={months} series={trend.series.filter((s) => s.key !== TREND_REST)} />
      <details className="mt-3">
        <summary className="cursor-pointer text-sm font-medium text-copper-dark">Numbers per month</summary>
        <div className="mt-2">
          <NumberTable
            caption="Closed cases per month and cause"
            testId="trend-table"
            rows={months}
            rowKey={(m) => m.month}
            columns={[
              { key: "month", label: "Month", cell: (m) => m.label },
              ...trend.series.map((s) => ({ key: s.key, label: s.name, numeric: true, cell: (m: Row) => String(m[s.key] ?? 0) })),
            ]}
          />
        </div>
      </details>
    </Panel>
  );
}
