import type { StoredRanking } from "@/lib/triage/ranking-types";
import { percent } from "@/lib/format";

/** Causes by probability with bars; ruled-out causes below, each with the answer that ruled it out. */
export function CauseRanking({ ranking, nameOf, explainAnswer }: {
  ranking: StoredRanking;
  nameOf: (slug: string) => string;
  explainAnswer: (nodeKey: string, optionKey: string) => string;
}) {
  const live = ranking.causes.filter((c) => c.probability > 0);
  const out = ranking.causes.filter((c) => c.probability === 0);
  const top = Math.max(ranking.unlisted, ...live.map((c) => c.probability), 0.01);
  return (
    <div className="flex flex-col gap-3" data-testid="cause-ranking">
      <ol className="flex flex-col gap-2">
        {live.map((c, i) => (
          <li key={c.causeId} data-testid="ranked-cause" data-cause={c.causeId}>
            <div className="flex items-baseline justify-between gap-2 text-sm">
              <span className={i === 0 ? "font-semibold" : ""}>{nameOf(c.causeId)}</span>
              <span className="whitespace-nowrap font-mono tabular-nums">{percent(c.probability)}</span>
            </div>
            <div className="mt-1 h-2.5 rounded-full bg-paper-deep" aria-hidden="true">
              <div className="h-2.5 rounded-full bg-copper" style={{ width: `${(c.probability / top) * 100}%` }} />
            </div>
          </li>
        ))}
        <li data-testid="unlisted-share">
          <div className="flex items-baseline justify-between gap-2 text-sm text-ink-soft">
            <span>None of the listed causes</span>
            <span className="whitespace-nowrap font-mono tabular-nums">{percent(ranking.unlisted)}</span>
          </div>
          <div className="mt-1 h-2.5 rounded-full bg-paper-deep" aria-hidden="true">
            <div className="h-2.5 rounded-full bg-ink-faint" style={{ width: `${(ranking.unlisted / top) * 100}%` }} />
          </div>
        </li>
      </ol>
      {out.length > 0 ? (
        <div>
          <h3 className="text-sm font-semibold text-ink-soft">Ruled out</h3>
          <ul className="mt-1 flex flex-col gap-1 text-sm">
            {out.map((c) => (
              <li key={c.causeId} data-testid="ruled-out" className="text-ink-soft">
                <span className="line-through decoration-ink-faint">{nameOf(c.causeId)}</span>
                {c.ruledOutBy ? <span className="block text-xs">ruled out by: {explainAnswer(c.ruledOutBy.nodeId, c.ruledOutBy.optionId)}</span> : null}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
