import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { formatDay } from "@/lib/format";
import type { PracticeCaseRow } from "@/lib/practice/queries";
import { ScrollRegion } from "@/components/ui/scroll-region";

const RIDING: Record<string, string> = { road: "road", trail: "trail", cargo: "cargo", commuting: "commuting" };

export function PracticeCaseList({ rows }: { rows: PracticeCaseRow[] }) {
  if (rows.length === 0) {
    return <EmptyState title="No closed cases to practise on yet.">Cases appear here once they are closed with a confirmed cause.</EmptyState>;
  }
  return (
    <ScrollRegion label="Closed cases to practise on" className="overflow-x-auto rounded-lg border border-ink-faint/30 bg-white">
      <table className="w-full text-sm" data-testid="practice-cases">
        <thead className="bg-paper-deep text-left text-xs uppercase tracking-wide text-ink-soft">
          <tr>
            <th className="min-w-48 px-3 py-2">The call</th>
            <th className="px-3 py-2">Motor family</th>
            <th className="px-3 py-2">Riding</th>
            <th className="px-3 py-2">Caller</th>
            <th className="px-3 py-2 text-right">Answers</th>
            <th className="px-3 py-2">Closed</th>
            <th className="px-3 py-2"><span className="sr-only">Your attempts</span></th>
          </tr>
        </thead>
        <tbody className="divide-y divide-ink-faint/20">
          {rows.map((r) => (
            <tr key={r.id}>
              <td className="px-3 py-2">
                <Link href={`/practice/${r.id}`} className="font-medium" data-testid="practice-case-link">{r.treeTitle}</Link>
                <span className="block text-xs text-ink-faint">{r.symptom}</span>
              </td>
              <td className="px-3 py-2">{r.family}</td>
              <td className="px-3 py-2">{RIDING[r.ridingUse] ?? r.ridingUse}</td>
              <td className="px-3 py-2">{r.callerKind}</td>
              <td className="px-3 py-2 text-right font-mono">{r.steps}</td>
              <td className="px-3 py-2 whitespace-nowrap">{formatDay(r.closedAt)}</td>
              <td className="px-3 py-2 text-xs">{r.attempts ? <span className="rounded bg-moss-light px-2 py-0.5 text-moss">done{r.attempts > 1 ? ` ×${r.attempts}` : ""}</span> : null}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
