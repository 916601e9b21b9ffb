import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { Panel } from "@/components/ui/panel";
import { causePareto } from "@/lib/reports/pareto";
import { dayString, filterQuery, parseReportFilter } from "@/lib/reports/period";
import { resolveScope } from "@/lib/reports/scope";
import { pct } from "@/lib/format";

/** The lead's home: the five most frequent confirmed causes of the calendar quarter so far. */
export async function TopCausesPanel({ today = new Date() }: { today?: Date }) {
  const quarterStart = new Date(Date.UTC(today.getUTCFullYear(), Math.floor(today.getUTCMonth() / 3) * 3, 1));
  const filter = parseReportFilter({ from: dayString(quarterStart), to: dayString(today) }, today);
  const pareto = await causePareto(await resolveScope(filter));
  const top = pareto.rows.slice(0, 5);
  return (
    <Panel title="Top causes this quarter" actions={<Link href={`/reports?${filterQuery(filter)}`} className="text-sm">All reports</Link>}>
      {top.length === 0 ? <EmptyState title="No cases closed this quarter yet." /> : (
        <ol className="flex flex-col gap-2" data-testid="top-causes">
          {top.map((r) => (
            <li key={r.key} className="flex flex-col gap-0.5">
              <div className="flex items-baseline justify-between gap-3 text-sm">
                <span>{r.name}</span>
                <span className="whitespace-nowrap font-mono tabular-nums text-ink-soft">{r.n} · {pct(r.share, 0)}</span>
              </div>
              <span className="h-1.5 rounded bg-paper-deep" aria-hidden="true">
                <span className="block h-1.5 rounded bg-copper" style={{ width: `${Math.max(2, Math.round((r.share / top[0].share) * 100))}%` }} />
              </span>
            </li>
          ))}
        </ol>
      )}
      <p className="mt-2 text-xs text-ink-faint">{pareto.total} closed case{pareto.total === 1 ? "" : "s"} since {dayString(quarterStart)}.</p>
    </Panel>
  );
}
