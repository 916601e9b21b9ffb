import { useId } from "react";

type InputProps = React.InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string; hint?: string };

export function Field({ label, error, hint, id, className = "", ...input }: InputProps) {
  const generated = useId();
  const fieldId = id ?? generated;
  const describedBy = error ? `${fieldId}-error` : hint ? `${fieldId}-hint` : undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={fieldId} className="text-sm font-medium text-ink-soft">{label}</label>
      <input
        id={fieldId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`rounded-md border bg-white px-3 py-2 text-ink shadow-inner ${error ? "border-danger" : "border-ink-faint/50"}`}
        {...input}
      />
      {error ? <p id={`${fieldId}-error`} className="text-sm text-danger">{error}</p> :
        hint ? <p id={`${fieldId}-hint`} className="text-xs text-ink-faint">{hint}</p> : null}
    </div>
  );
}

type SelectProps = React.SelectHTMLAttributes<HTMLSelectElement> & { label: string; error?: string; options: { value: string; label: string }[] };

export function SelectField({ label, error, id, options, className = "", ...select }: SelectProps) {
  const generated = useId();
  const fieldId = id ?? generated;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={fieldId} className="text-sm font-medium text-ink-soft">{label}</label>
      <select
        id={fieldId}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${fieldId}-error` : undefined}
        className={`rounded-md border bg-white px-3 py-2 ${error ? "border-danger" : "border-ink-faint/50"}`}
        {...select}
      >
        {options.map((o) => <option key={o.value} value={o.value}>{o.label}</option>)}
      </select>
      {error ? <p id={`${fieldId}-error`} className="text-sm text-danger">{error}</p> : null}
    </div>
  );
}
