import type { StoredRanking } from "@/lib/triage/ranking-types";
import { EmptyState } from "@/components/ui/empty-state";
import { percent } from "@/lib/format";

export interface StepView {
  seq: number;
  question: string;
  answer: string;
  by: string | null;
  at: Date;
  ranking: StoredRanking;
}


/** The recorded answers, each with the ranking the technician saw after it (collapsed). */
export function StepList({ steps, nameOf, titleOf }: { steps: StepView[]; nameOf: (slug: string) => string; titleOf: (key: string) => string }) {
  if (steps.length === 0) return <EmptyState title="No answers recorded." />;
  return (
    <ol className="flex flex-col gap-2" data-testid="case-steps">
      {steps.map((s) => (
        <li key={s.seq} data-testid="case-step" className="rounded-md border border-ink-faint/30 bg-white">
          <details>
            <summary className="flex cursor-pointer flex-wrap items-baseline gap-x-3 px-3 py-2">
              <span className="font-mono text-ink-faint">{s.seq}</span>
              <span className="flex-1"><span className="text-ink-soft">{s.question}</span> → <strong>{s.answer}</strong></span>
              <span className="text-xs text-ink-faint">{s.by ?? "someone"} · {s.at.toISOString().slice(11, 16)} UTC</span>
            </summary>
            <div className="grid gap-3 border-t border-ink-faint/20 px-3 py-2 text-sm md:grid-cols-2">
              <div>
                <p className="font-medium">Ranking shown</p>
                <ul>
                  {s.ranking.causes.filter((c) => c.probability > 0).slice(0, 6).map((c) => (
                    <li key={c.causeId} className="flex justify-between gap-2"><span>{nameOf(c.causeId)}</span><span className="whitespace-nowrap font-mono">{percent(c.probability)}</span></li>
                  ))}
                  <li className="flex justify-between gap-2 text-ink-soft"><span>None of the listed</span><span className="whitespace-nowrap font-mono">{percent(s.ranking.unlisted)}</span></li>
                </ul>
              </div>
              <div>
                <p className="font-medium">Suggested next</p>
                <ul>{s.ranking.suggestions.slice(0, 3).map((q) => <li key={q.nodeId}>{titleOf(q.nodeId)} <span className="font-mono text-ink-soft">{q.gainBits.toFixed(2)} bits</span></li>)}</ul>
                <p className="mt-1 text-ink-soft">Stop rule: {s.ranking.conclusion.kind === "continue" ? "keep asking" : s.ranking.conclusion.kind === "unlisted" ? "none of the listed causes fits" : `conclude on ${nameOf(s.ranking.conclusion.causeId ?? "")}`}</p>
              </div>
            </div>
          </details>
        </li>
      ))}
    </ol>
  );
}
