import type { StoredRanking } from "@/lib/triage/ranking-types";
import { EmptyState } from "@/components/ui/empty-state";
import { bits } from "@/lib/format";

/** The best next questions by expected information gain per minute; picking one jumps the walk there. */
export function NextQuestions({ suggestions, currentKey, titleOf, nameOf, onPick, disabled }: {
  suggestions: StoredRanking["suggestions"];
  currentKey: string | null;
  titleOf: (nodeKey: string) => string;
  nameOf: (slug: string) => string;
  onPick: (nodeKey: string) => void;
  disabled: boolean;
}) {
  if (suggestions.length === 0) return <EmptyState title="No question left that would tell the causes apart." />;
  return (
    <ol className="flex flex-col gap-2" data-testid="suggestions">
      {suggestions.map((s, i) => (
        <li key={s.nodeId}>
          <button type="button" onClick={() => onPick(s.nodeId)} disabled={disabled || s.nodeId === currentKey}
            data-testid="suggestion" data-node={s.nodeId}
            className="w-full rounded-lg border border-ink-faint/40 bg-white p-3 text-left hover:border-copper disabled:cursor-default disabled:border-copper/50 disabled:bg-copper-light/30">
            <span className="flex items-baseline justify-between gap-2">
              <span className="font-medium">{i + 1}. {titleOf(s.nodeId)}</span>
              <span className="shrink-0 font-mono text-xs text-ink-soft">{bits(s.gainBits)}{s.gainPerMinute !== s.gainBits ? ` · ${s.gainPerMinute.toFixed(2)}/min` : ""}</span>
            </span>
            <span className="mt-1 block text-xs text-ink-soft">
              {s.nodeId === currentKey ? "Being asked now. " : ""}
              {s.separates.length ? `Separates ${s.separates.map(nameOf).join(", ")}` : "Changes little between the causes"}
            </span>
          </button>
        </li>
      ))}
    </ol>
  );
}
