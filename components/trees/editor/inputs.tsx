"use client";
import { useId } from "react";

const box = "w-full rounded border border-ink-faint/50 bg-white px-2 py-1.5 text-sm text-ink disabled:bg-paper";

export function TextInput({ label, value, onChange, maxLength, disabled, hint }: {
  label: string; value: string; onChange: (v: string) => void; maxLength?: number; disabled?: boolean; hint?: string;
}) {
  const id = useId();
  return (
    <div className="flex flex-col gap-0.5">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">{label}</label>
      <input id={id} className={box} value={value} maxLength={maxLength} disabled={disabled} onChange={(e) => onChange(e.target.value)} />
      {hint ? <p className="text-[11px] text-ink-faint">{hint}</p> : null}
    </div>
  );
}

export function TextArea({ label, value, onChange, maxLength, disabled, rows = 3 }: {
  label: string; value: string; onChange: (v: string) => void; maxLength?: number; disabled?: boolean; rows?: number;
}) {
  const id = useId();
  return (
    <div className="flex flex-col gap-0.5">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">{label}</label>
      <textarea id={id} className={box} rows={rows} value={value} maxLength={maxLength} disabled={disabled} onChange={(e) => onChange(e.target.value)} />
    </div>
  );
}

export function NumberInput({ label, value, onChange, min, max, step = 1, disabled }: {
  label: string; value: number; onChange: (v: number) => void; min: number; max: number; step?: number; disabled?: boolean;
}) {
  const id = useId();
  return (
    <div className="flex flex-col gap-0.5">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">{label}</label>
      <input
        id={id} type="number" className={`${box} w-28`} value={Number.isFinite(value) ? value : ""} min={min} max={max} step={step} disabled={disabled}
        onChange={(e) => {
          const n = e.target.valueAsNumber;
          if (Number.isFinite(n)) onChange(Math.min(max, Math.max(min, n)));
        }}
      />
    </div>
  );
}

export function Checkbox({ label, checked, onChange, disabled }: { label: string; checked: boolean; onChange: (v: boolean) => void; disabled?: boolean }) {
  return (
    <label className="flex items-center gap-2 text-sm text-ink">
      <input type="checkbox" checked={checked} disabled={disabled} onChange={(e) => onChange(e.target.checked)} />
      {label}
    </label>
  );
}

export function SmallButton({ children, onClick, disabled, tone = "plain", title }: {
  children: React.ReactNode; onClick: () => void; disabled?: boolean; tone?: "plain" | "danger" | "primary"; title?: string;
}) {
  const tones = {
    plain: "border-ink-faint/60 bg-white text-ink hover:bg-paper",
    danger: "border-danger/50 bg-white text-danger hover:bg-danger-light",
    primary: "border-copper bg-copper text-white hover:bg-copper-dark",
  };
  return (
    <button type="button" onClick={onClick} disabled={disabled} title={title} className={`rounded border px-2 py-1 text-xs font-medium disabled:opacity-40 ${tones[tone]}`}>
      {children}
    </button>
  );
}
