import { percent } from "@/lib/format";
import type { RankedCause } from "@/lib/bench/types";

const RESULT_LABEL = { found: "found", not_found: "not found", not_done: "not done" } as const;

/** The causes by probability after the findings so far. */
export function RankingCard({ ranking, unlisted }: { ranking: RankedCause[]; unlisted: number }) {
  const shown = ranking.filter((c) => c.probability > 0 || c.result).slice(0, 8);
  const top = Math.max(unlisted, ...shown.map((c) => c.probability), 0.01);
  return (
    <ol className="flex flex-col gap-2" data-testid="bench-ranking">
      {shown.map((c, i) => (
        <li key={c.slug} data-testid="bench-ranked" data-cause={c.slug} data-probability={c.probability.toFixed(4)}>
          <div className="flex items-baseline justify-between gap-2 text-sm">
            <span className={`min-w-0 ${i === 0 ? "font-semibold" : ""}`}>
              {c.name}
              {c.result ? <span className="ml-1 text-xs text-ink-soft">({RESULT_LABEL[c.result]})</span> : null}
            </span>
            <span className="shrink-0 font-mono tabular-nums">{percent(c.probability)}</span>
          </div>
          <div className="mt-1 h-2 rounded-full bg-paper-deep" aria-hidden="true">
            <div className={`h-2 rounded-full ${c.result === "found" ? "bg-moss" : "bg-copper"}`} style={{ width: `${(c.probability / top) * 100}%` }} />
          </div>
        </li>
      ))}
      <li className="flex items-baseline justify-between gap-2 text-sm text-ink-soft">
        <span>None of the listed causes</span>
        <span className="shrink-0 font-mono tabular-nums">{percent(unlisted)}</span>
      </li>
    </ol>
  );
}
