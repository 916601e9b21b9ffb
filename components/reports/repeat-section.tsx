import Link from "next/link";
import { Panel, Stat } from "@/components/ui/panel";
import type { RepeatRate } from "@/lib/reports/repeats";
import { interval, pct, whole } from "@/lib/format";

export function RepeatSection({ repeats }: { repeats: RepeatRate }) {
  return (
    <Panel title="Repeat returns">
      <p className="mb-3 text-sm text-ink-soft">A unit back with the same serial within 90 days of an earlier case of its family.</p>
      <div className="grid gap-3 sm:grid-cols-3" data-testid="repeat-stats">
        <Stat label="Repeat-return rate" value={repeats.closed ? pct(repeats.rate) : "—"} hint={repeats.closed ? `95 % interval ${interval(repeats.low, repeats.high)}` : undefined} />
        <Stat label="Repeat returns" value={whole.format(repeats.repeats)} />
        <Stat label="Closed cases" value={whole.format(repeats.closed)} />
      </div>
      {repeats.recent.length ? (
        <ul className="mt-4 flex flex-col gap-1 text-sm">
          {repeats.recent.map((r) => (
            <li key={r.caseId}>
              <Link href={`/cases/${r.caseId}`}>{r.reference}</Link> came back {r.days} days after <Link href={`/cases/${r.earlierId}`}>{r.earlierReference}</Link>
            </li>
          ))}
        </ul>
      ) : null}
    </Panel>
  );
}
