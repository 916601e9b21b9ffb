import { percent as pct } from "@/lib/format";
import type { SuggestionView } from "@/lib/review/types";
import { certaintySentence, proposalSentence, strengthSentence, suggestionSentence } from "@/lib/review/words";

const width = (x: number) => `${Math.round(x * 100)}%`;

/**
 * One reviewed column: the sentence, then per answer what the shop saw (count and share), what the
 * tree says and what was learned, how sure the shop can be, and the proposed change.
 */
export function SuggestionText({ s, context }: { s: SuggestionView; context?: string }) {
  return (
    <div className="flex flex-col gap-2">
      <p className="text-sm">{suggestionSentence(s)}</p>
      {context ? <p className="text-xs text-ink-soft">{context}</p> : null}
      <table className="w-full max-w-xl text-xs" data-testid="suggestion-column">
        <thead className="text-left text-ink-faint">
          <tr>
            <th className="py-0.5 pr-2 font-normal">Answer</th>
            <th className="px-2 text-right font-normal">Cases</th>
            <th className="px-2 text-right font-normal">Tree</th>
            <th className="px-2 text-right font-normal">Learned</th>
            <th className="w-32 pl-2 font-normal"><span className="sr-only">Tree against learned</span></th>
          </tr>
        </thead>
        <tbody>
          {s.rows.map((r) => (
            <tr key={r.optionKey} className={r.optionKey === s.optionKey ? "font-medium" : "text-ink-soft"}>
              <td className="py-0.5 pr-2">{r.optionLabel}</td>
              <td className="px-2 text-right font-mono">{r.count}</td>
              <td className="px-2 text-right font-mono">{pct(r.authored)}</td>
              <td className="px-2 text-right font-mono">{pct(r.learned)}</td>
              <td className="pl-2" aria-hidden="true">
                <span className="block h-1.5 rounded bg-paper-deep"><span className="block h-1.5 rounded bg-ink-faint" style={{ width: width(r.authored) }} /></span>
                <span className="mt-0.5 block h-1.5 rounded bg-paper-deep"><span className="block h-1.5 rounded bg-copper" style={{ width: width(r.learned) }} /></span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="text-xs text-ink-soft">{certaintySentence(s.logBayesFactor)} {strengthSentence(s)}</p>
      <p className="text-xs">{proposalSentence(s)}</p>
    </div>
  );
}
