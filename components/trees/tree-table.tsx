import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import type { TreeListRow } from "@/lib/trees/queries";
import { ProblemCount, StatusBadge, VersionBadge } from "./status-badge";
import { ScrollRegion } from "@/components/ui/scroll-region";
import { formatDay } from "@/lib/format";


export function TreeTable({ rows, filtered }: { rows: TreeListRow[]; filtered: boolean }) {
  if (rows.length === 0) {
    return <EmptyState title={filtered ? "No tree matches these filters." : "No trees yet."}>{filtered ? "Clear the search or pick another status." : "Start one from nothing or import a tree file."}</EmptyState>;
  }
  return (
    <ScrollRegion label="Trees" className="overflow-x-auto">
      <table className="w-full text-left text-sm" data-testid="tree-table">
        <thead className="border-b border-ink-faint/40 text-xs uppercase tracking-wide text-ink-faint">
          <tr>
            <th scope="col" className="py-2 pr-3">Symptom</th>
            <th scope="col" className="py-2 pr-3">Motor families</th>
            <th scope="col" className="py-2 pr-3">Status</th>
            <th scope="col" className="py-2 pr-3">Latest</th>
            <th scope="col" className="py-2 pr-3">Last edited</th>
            <th scope="col" className="py-2">Problems</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.id} className="border-b border-ink-faint/20 align-top">
              <td className="py-2 pr-3">
                <Link href={`/trees/${r.id}`} className="font-medium">{r.symptom}</Link>
                <p className="text-xs text-ink-soft">{r.title}</p>
              </td>
              <td className="py-2 pr-3 text-ink-soft">{r.scope.length ? r.scope.map((s) => s.label).join(", ") : "All families"}</td>
              <td className="py-2 pr-3"><StatusBadge status={r.status} /></td>
              <td className="py-2 pr-3">{r.latestNumber !== null && r.latestState ? <VersionBadge state={r.latestState} number={r.latestNumber} /> : "—"}</td>
              <td className="py-2 pr-3 text-ink-soft">{r.lastEditor ?? "—"}{r.editedAt ? <span className="block text-xs text-ink-faint">{formatDay(r.editedAt)}</span> : null}</td>
              <td className="py-2"><ProblemCount n={r.problems} /></td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
