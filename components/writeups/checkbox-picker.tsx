"use client";
import { useId, useState } from "react";

export interface PickerOption {
  value: number;
  label: string;
  hint?: string;
}

/** A filterable list of check boxes; the chosen values are posted under `name`. */
export function CheckboxPicker({ name, label, options, selected, onChange, error }: {
  name: string;
  label: string;
  options: PickerOption[];
  selected: number[];
  onChange: (next: number[]) => void;
  error?: string;
}) {
  const id = useId();
  const [filter, setFilter] = useState("");
  const needle = filter.trim().toLowerCase();
  const shown = needle ? options.filter((o) => `${o.label} ${o.hint ?? ""}`.toLowerCase().includes(needle)) : options;
  const chosen = new Set(selected);
  const toggle = (value: number) => onChange(chosen.has(value) ? selected.filter((v) => v !== value) : [...selected, value]);
  return (
    <fieldset className="flex min-w-0 flex-col gap-2" aria-describedby={error ? `${id}-error` : undefined}>
      <legend className="text-sm font-medium text-ink-soft">{label}{selected.length ? ` · ${selected.length} chosen` : ""}</legend>
      {options.length > 8 ? (
        <input
          type="search"
          value={filter}
          onChange={(e) => setFilter(e.target.value)}
          placeholder={`Filter ${label.toLowerCase()}`}
          aria-label={`Filter ${label.toLowerCase()}`}
          className="rounded-md border border-ink-faint/50 bg-white px-2 py-1 text-sm"
        />
      ) : null}
      <ul className={`max-h-48 overflow-y-auto rounded-md border bg-white p-1 ${error ? "border-danger" : "border-ink-faint/40"}`}>
        {shown.map((o) => (
          <li key={o.value}>
            <label className="flex cursor-pointer items-baseline gap-2 rounded px-2 py-1 text-sm hover:bg-paper">
              <input type="checkbox" name={name} value={o.value} checked={chosen.has(o.value)} onChange={() => toggle(o.value)} />
              <span>{o.label}</span>
              {o.hint ? <span className="text-xs text-ink-faint">{o.hint}</span> : null}
            </label>
          </li>
        ))}
        {shown.length === 0 ? <li className="px-2 py-1 text-sm text-ink-faint">Nothing matches “{filter}”.</li> : null}
      </ul>
      {/* Chosen boxes hidden by the filter still have to be posted. */}
      {selected.filter((v) => !shown.some((o) => o.value === v)).map((v) => <input key={v} type="hidden" name={name} value={v} />)}
      {error ? <p id={`${id}-error`} className="text-sm text-danger">{error}</p> : null}
    </fieldset>
  );
}
