import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { Panel } from "@/components/ui/panel";
import { treesNeedingWork } from "@/lib/trees/queries";
import { ProblemCount } from "./status-badge";

/** For the senior's home: open drafts, the ones with most problems first. */
export async function TreeDraftsPanel() {
  const rows = await treesNeedingWork();
  return (
    <Panel title="Trees with drafts or problems" actions={<Link href="/trees?status=draft" className="text-sm">All drafts</Link>}>
      {rows.length === 0 ? <EmptyState title="No drafts open.">Every tree is as published.</EmptyState> : (
        <ul className="flex flex-col gap-2" data-testid="home-tree-drafts">
          {rows.map((r) => (
            <li key={r.id} className="flex items-center justify-between gap-2 text-sm">
              <span><Link href={`/trees/${r.id}/edit`}>{r.symptom}</Link> <span className="text-xs text-ink-faint">draft v{r.latestNumber}{r.lastEditor ? `, ${r.lastEditor}` : ""}</span></span>
              <ProblemCount n={r.problems} />
            </li>
          ))}
        </ul>
      )}
    </Panel>
  );
}
