"use client";
import { useEffect, useState } from "react";
import type { CaseTableQuery } from "@/lib/cases/cases-key";
import { STATUS_LABEL } from "./status-badge";

export interface FilterChoices {
  families: { id: number; label: string }[];
  symptoms: string[];
  technicians: { id: string; name: string }[];
}

const input = "rounded-md border border-ink-faint/50 bg-white px-2 py-1.5 text-sm";

/** Filters for the case table; each change goes to the URL and resets to the first page. */
export function CaseFilters({ query, choices, onChange }: {
  query: CaseTableQuery;
  choices: FilterChoices;
  onChange: (patch: Partial<CaseTableQuery>) => void;
}) {
  const [search, setSearch] = useState(query.q ?? "");
  useEffect(() => {
    if (search === (query.q ?? "")) return;
    const t = setTimeout(() => onChange({ q: search || undefined }), 350);
    return () => clearTimeout(t);
  }, [search, query.q, onChange]);

  const select = (key: keyof CaseTableQuery, label: string, options: { value: string; label: string }[]) => (
    <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
      {label}
      <select className={`${input} max-w-52`} value={String(query[key] ?? "")} onChange={(e) => onChange({ [key]: e.target.value || undefined })}>
        <option value="">any</option>
        {options.map((o) => <option key={o.value} value={o.value}>{o.label}</option>)}
      </select>
    </label>
  );

  return (
    <div className="flex flex-wrap items-end gap-2" data-testid="case-filters">
      <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
        Search
        <input className={`${input} w-48`} type="search" placeholder="reference, caller or serial" value={search} onChange={(e) => setSearch(e.target.value)} />
      </label>
      {select("status", "Status", Object.entries(STATUS_LABEL).map(([value, label]) => ({ value, label })))}
      {select("family", "Motor family", choices.families.map((f) => ({ value: String(f.id), label: f.label })))}
      {select("symptom", "Symptom", choices.symptoms.map((s) => ({ value: s, label: s })))}
      {select("technician", "Technician", choices.technicians.map((t) => ({ value: t.id, label: t.name })))}
      <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
        From
        <input className={input} type="date" value={query.from ?? ""} onChange={(e) => onChange({ from: e.target.value || undefined })} />
      </label>
      <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
        To
        <input className={input} type="date" value={query.to ?? ""} onChange={(e) => onChange({ to: e.target.value || undefined })} />
      </label>
    </div>
  );
}
