import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { Panel } from "@/components/ui/panel";
import { formatDay } from "@/lib/format";
import { currentUser } from "@/lib/auth/session";
import { practiceHistory } from "@/lib/practice/history";

/** The signed-in trainee's practice record, for the home page. */
export async function PracticeHistoryPanel() {
  const user = await currentUser();
  if (!user) return null;
  const history = await practiceHistory(user.id);
  return (
    <Panel title="Practice" actions={<Link href="/practice" className="text-sm">Practise a case →</Link>}>
      {history.attempts === 0 ? (
        <EmptyState title="No practice cases done yet.">Pick a closed case, walk it, and commit to a cause before the bench result shows.</EmptyState>
      ) : (
        <div className="flex flex-col gap-4" data-testid="practice-history">
          <dl className="grid grid-cols-3 gap-3 text-center">
            <div><dt className="text-xs uppercase tracking-wide text-ink-faint">Cases done</dt><dd className="text-2xl font-semibold">{history.casesDone}</dd></div>
            <div><dt className="text-xs uppercase tracking-wide text-ink-faint">Top-1 hits</dt><dd className="text-2xl font-semibold">{history.hits}</dd></div>
            <div>
              <dt className="text-xs uppercase tracking-wide text-ink-faint">Hit rate</dt>
              <dd className="text-2xl font-semibold">{Math.round((100 * history.hits) / history.attempts)}%</dd>
            </div>
          </dl>
          <p className="text-xs text-ink-faint">{history.hits} of {history.attempts} attempt{history.attempts === 1 ? "" : "s"} named a cause the bench confirmed.</p>
          <ul className="divide-y divide-ink-faint/20 text-sm">
            {history.recent.map((a) => (
              <li key={a.id} className="flex items-baseline justify-between gap-2 py-1.5">
                <Link href={`/practice/${a.caseId}`} className="truncate">{a.symptom} · {a.family}</Link>
                <span className={`shrink-0 rounded px-2 py-0.5 text-xs ${a.hit ? "bg-moss-light text-moss" : "bg-copper-light text-copper-dark"}`}>
                  {a.hit ? "hit" : "miss"} · {formatDay(a.finishedAt)}
                </span>
              </li>
            ))}
          </ul>
        </div>
      )}
    </Panel>
  );
}
