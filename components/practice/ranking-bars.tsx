import type { RankingView } from "@/lib/practice/types";
import { percentFine } from "@/lib/format";

/** The engine's ranking as bars; causes ruled out are listed apart with the answer that did it. */
export function RankingBars({ ranking, limit = 6 }: { ranking: RankingView; limit?: number }) {
  const live = ranking.causes.filter((c) => c.probability > 0);
  const out = ranking.causes.filter((c) => c.probability === 0);
  return (
    <div className="flex flex-col gap-3" data-testid="practice-ranking">
      <ol className="flex flex-col gap-2">
        {live.slice(0, limit).map((c, i) => (
          <li key={c.slug}>
            <div className="flex items-baseline justify-between gap-2 text-sm">
              <span className={i === 0 ? "font-semibold" : ""}>{c.name}</span>
              <span className="whitespace-nowrap font-mono text-xs text-ink-soft">{percentFine(c.probability)}</span>
            </div>
            <div className="mt-0.5 h-2 rounded-full bg-paper-deep" aria-hidden="true">
              <div className={`h-2 rounded-full ${i === 0 ? "bg-copper" : "bg-ink-faint"}`} style={{ width: `${Math.max(1, c.probability * 100)}%` }} />
            </div>
          </li>
        ))}
      </ol>
      <p className="text-xs text-ink-faint">None of the listed causes: {percentFine(ranking.unlisted)}</p>
      {out.length ? (
        <details className="text-xs text-ink-soft">
          <summary className="cursor-pointer">{out.length} ruled out</summary>
          <ul className="mt-1 flex flex-col gap-1">
            {out.map((c) => <li key={c.slug}><span className="line-through">{c.name}</span>{c.ruledOutBy ? ` — ${c.ruledOutBy}` : ""}</li>)}
          </ul>
        </details>
      ) : null}
    </div>
  );
}
