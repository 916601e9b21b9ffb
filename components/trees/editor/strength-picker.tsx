"use client";
import type { StrengthName } from "@/db/schema";
import { STRENGTHS } from "@/lib/diagnosis";
import { STRENGTH_STEPS } from "../strength-steps";

/** Our own compact five-step control: a symbol per step, the word in its tooltip and for screen readers. */
export function StrengthLegend() {
  return (
    <p className="flex flex-wrap gap-x-3 gap-y-1 text-xs text-ink-soft" aria-hidden="true">
      {STRENGTHS.map((s) => (
        <span key={s}><span className="font-mono font-semibold">{STRENGTH_STEPS[s].symbol}</span> {STRENGTH_STEPS[s].word}</span>
      ))}
    </p>
  );
}

export function StrengthPicker({ cause, value, onChange, disabled }: {
  cause: string;
  value: StrengthName;
  onChange: (s: StrengthName) => void;
  disabled?: boolean;
}) {
  return (
    <div role="radiogroup" aria-label={`Evidence for ${cause}`} className="inline-flex shrink-0 overflow-hidden rounded border border-ink-faint/50">
      {STRENGTHS.map((s) => {
        const step = STRENGTH_STEPS[s];
        const checked = value === s;
        return (
          <button
            key={s}
            type="button"
            role="radio"
            aria-checked={checked}
            aria-label={step.word}
            title={step.word}
            disabled={disabled}
            onClick={() => onChange(s)}
            className={`h-7 w-8 border-l font-mono text-xs font-semibold first:border-l-0 disabled:opacity-40 ${checked ? step.on : "border-ink-faint/30 bg-white text-ink-faint hover:bg-paper"}`}
          >
            {step.symbol}
          </button>
        );
      })}
    </div>
  );
}
