import type { SuggestionView } from "@/lib/review/types";
import { proposalSentence, suggestionSentence } from "@/lib/review/words";

/** One suggestion in plain words, with a small bar pair: what the tree says against what the shop saw. */
export function SuggestionText({ s, context }: { s: SuggestionView; context?: string }) {
  return (
    <div className="flex flex-col gap-1">
      <p className="text-sm">{suggestionSentence(s)}</p>
      <p className="text-xs text-ink-soft">Question: {s.nodeTitle}{context ? ` · ${context}` : ""}</p>
      <div className="flex max-w-md flex-col gap-0.5" aria-hidden="true">
        <Bar label="tree" value={s.authored} className="bg-ink-faint" />
        <Bar label="shop" value={s.learned} className="bg-copper" />
      </div>
      <p className="text-xs text-ink-soft">{proposalSentence(s)}</p>
    </div>
  );
}

function Bar({ label, value, className }: { label: string; value: number; className: string }) {
  return (
    <div className="flex items-center gap-2 text-[11px] text-ink-faint">
      <span className="w-8">{label}</span>
      <span className="h-2 flex-1 rounded bg-paper-deep"><span className={`block h-2 rounded ${className}`} style={{ width: `${Math.round(value * 100)}%` }} /></span>
      <span className="w-8 text-right font-mono">{value.toFixed(2)}</span>
    </div>
  );
}
