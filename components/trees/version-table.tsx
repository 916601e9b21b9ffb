import Link from "next/link";
import type { VersionRow } from "@/lib/trees/queries";
import { VersionBadge } from "./status-badge";
import { formatDayTime } from "@/lib/format";
import { ScrollRegion } from "@/components/ui/scroll-region";


export function VersionTable({ treeId, versions }: { treeId: number; versions: VersionRow[] }) {
  return (
    <ScrollRegion label="Versions" className="overflow-x-auto">
      <table className="w-full text-left text-sm" data-testid="version-table">
        <thead className="border-b border-ink-faint/40 text-xs uppercase tracking-wide text-ink-faint">
          <tr><th className="py-1 pr-3">Version</th><th className="py-1 pr-3">Last edit</th><th className="py-1 pr-3">Published</th><th className="py-1 pr-3">Note</th><th className="py-1">Files</th></tr>
        </thead>
        <tbody>
          {versions.map((v, i) => {
            const previous = versions[i + 1];
            return (
              <tr key={v.id} className="border-b border-ink-faint/20 align-top">
                <td className="py-1.5 pr-3"><VersionBadge state={v.state} number={v.number} /></td>
                <td className="py-1.5 pr-3 text-ink-soft">{v.editedBy ?? "—"} <span className="block text-xs text-ink-faint">{formatDayTime(v.editedAt)}</span></td>
                <td className="py-1.5 pr-3 text-ink-soft">{v.publishedAt ? <>{v.publishedBy ?? "—"}<span className="block text-xs text-ink-faint">{formatDayTime(v.publishedAt)}</span></> : "—"}</td>
                <td className="py-1.5 pr-3 text-ink-soft">{v.note || "—"}</td>
                <td className="py-1.5 text-xs">
                  <a href={`/api/trees/${treeId}/export?version=${v.number}`}>Export JSON</a>
                  {previous ? <> · <Link href={`/trees/${treeId}/versions?from=${previous.number}&to=${v.number}`}>Changes since v{previous.number}</Link></> : null}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
