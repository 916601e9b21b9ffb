import type { WalkStep } from "@/lib/triage/walk-types";

/** The answers so far, oldest first; the last one can be taken back. */
export function AnswerTrail({ steps, titleOf, labelOf, onUndo, disabled, saving }: {
  steps: WalkStep[];
  titleOf: (nodeKey: string) => string;
  labelOf: (optionKey: string) => string;
  onUndo: () => void;
  disabled: boolean;
  /** An answer or undo has been on its way for a noticeable time. */
  saving: boolean;
}) {
  const status = <p role="status" data-testid="walk-saving" className="text-xs text-ink-soft">{saving ? "Saving…" : ""}</p>;
  if (steps.length === 0) {
    return <div><p className="text-sm text-ink-soft">No answers yet. Number keys 1–9 answer; S skips; U takes back the last answer.</p>{status}</div>;
  }
  return (
    <div>
      <ol className="flex flex-col divide-y divide-ink-faint/20 text-sm" data-testid="answer-trail">
        {steps.map((s) => (
          <li key={s.seq} data-testid="trail-step" data-seq={s.seq} className="flex gap-3 py-1.5">
            <span className="w-6 shrink-0 text-right font-mono text-ink-faint">{s.seq}</span>
            <span className="flex-1">
              <span className="text-ink-soft">{titleOf(s.nodeKey)}</span> → <span className="font-medium">{labelOf(s.optionKey)}</span>
            </span>
          </li>
        ))}
      </ol>
      {status}
      <button type="button" onClick={onUndo} disabled={disabled} data-testid="undo"
        className="mt-2 rounded-md border border-ink-faint/60 px-3 py-1.5 text-sm hover:bg-paper-deep disabled:opacity-50">
        <kbd className="mr-1 font-mono">U</kbd> Undo the last answer
      </button>
    </div>
  );
}
