"use client";
import { memo } from "react";
import type { SearchFilters } from "@/lib/search/types";
import type { Facet } from "@/lib/search/writeup-index";

function FacetSelect({ id, label, facets, value, onChange }: {
  id: string;
  label: string;
  facets: Facet[];
  value: string | undefined;
  onChange: (value: string | undefined) => void;
}) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium text-ink-soft">{label}</label>
      <select
        id={id}
        value={value ?? ""}
        onChange={(e) => onChange(e.target.value || undefined)}
        className="rounded-md border border-ink-faint/50 bg-white px-2 py-1.5 text-sm"
      >
        <option value="">Any</option>
        {facets.map((f) => <option key={f.value} value={f.value}>{f.label} ({f.count})</option>)}
        {value && !facets.some((f) => f.value === value) ? <option value={value}>{value}</option> : null}
      </select>
    </div>
  );
}

/** Memoised, like the results: typing in the search box leaves the filters as they are. */
export const SearchFilterPanel = memo(function SearchFilterPanel({ facets, filters, onChange }: {
  facets: { families: Facet[]; causes: Facet[]; tags: Facet[] };
  filters: SearchFilters;
  onChange: (next: SearchFilters) => void;
}) {
  const active = !!(filters.family || filters.cause || filters.tag);
  return (
    <div className="flex flex-col gap-3" aria-label="Filters" role="group">
      <FacetSelect id="filter-family" label="Motor family" facets={facets.families} value={filters.family} onChange={(family) => onChange({ ...filters, family })} />
      <FacetSelect id="filter-cause" label="Cause" facets={facets.causes} value={filters.cause} onChange={(cause) => onChange({ ...filters, cause })} />
      <FacetSelect id="filter-tag" label="Tag" facets={facets.tags} value={filters.tag} onChange={(tag) => onChange({ ...filters, tag })} />
      {active ? (
        <button type="button" onClick={() => onChange({})} className="self-start text-sm text-copper-dark underline-offset-2 hover:underline">
          Clear filters
        </button>
      ) : null}
    </div>
  );
});
