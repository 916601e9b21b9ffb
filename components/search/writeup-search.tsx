"use client";
import { useRouter } from "next/navigation";
import { useDeferredValue, useEffect, useMemo, useState } from "react";
import { EmptyState } from "@/components/ui/empty-state";
import type { SearchFilters } from "@/lib/search/types";
import { SearchFilterPanel } from "./search-filters";
import { resultId, SearchResults } from "./search-results";
import { useWriteupIndex } from "./use-writeup-index";

function searchUrl(query: string, filters: SearchFilters): string {
  const params = new URLSearchParams();
  if (query.trim()) params.set("q", query.trim());
  for (const key of ["family", "cause", "tag"] as const) if (filters[key]) params.set(key, filters[key]!);
  const qs = params.toString();
  return qs ? `/writeups?${qs}` : "/writeups";
}

/** Search as you type over the published write-ups, with filters and arrow-key navigation. */
export function WriteupSearch({ initialQuery, initialFilters }: { initialQuery: string; initialFilters: SearchFilters }) {
  const router = useRouter();
  const { index, error, loading } = useWriteupIndex();
  const [query, setQuery] = useState(initialQuery);
  const [filters, setFilters] = useState<SearchFilters>(initialFilters);
  const [active, setActive] = useState(-1);
  const deferredQuery = useDeferredValue(query);
  const hits = useMemo(() => (index ? index.search(deferredQuery, filters) : []), [index, deferredQuery, filters]);
  const facets = useMemo(() => index?.facets() ?? { families: [], causes: [], tags: [] }, [index]);

  useEffect(() => { window.history.replaceState(null, "", searchUrl(query, filters)); }, [query, filters]);
  useEffect(() => {
    if (active >= 0 && hits[active]) document.getElementById(resultId(hits[active].doc.id))?.scrollIntoView({ block: "nearest" });
  }, [active, hits]);

  function onKeyDown(e: React.KeyboardEvent<HTMLInputElement>) {
    if (e.key === "ArrowDown") { e.preventDefault(); setActive((a) => Math.min(a + 1, hits.length - 1)); }
    else if (e.key === "ArrowUp") { e.preventDefault(); setActive((a) => Math.max(a - 1, 0)); }
    else if (e.key === "Enter") {
      e.preventDefault();
      const hit = hits[active >= 0 ? active : 0];
      if (hit) router.push(`/writeups/${hit.doc.id}`);
    } else if (e.key === "Escape") { setQuery(""); setActive(-1); }
  }

  const filtered = !!(filters.family || filters.cause || filters.tag);
  return (
    <div className="grid gap-6 md:grid-cols-[15rem_minmax(0,1fr)]">
      <aside className="md:pt-[4.5rem]"><SearchFilterPanel facets={facets} filters={filters} onChange={(f) => { setFilters(f); setActive(-1); }} /></aside>
      <div className="flex min-w-0 flex-col gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor="writeup-search" className="text-sm font-medium text-ink-soft">Search write-ups</label>
          <input
            id="writeup-search"
            type="search"
            role="combobox"
            aria-expanded={hits.length > 0}
            aria-controls="writeup-results"
            aria-autocomplete="list"
            aria-activedescendant={active >= 0 && hits[active] ? resultId(hits[active].doc.id) : undefined}
            autoComplete="off"
            autoFocus
            value={query}
            onChange={(e) => { setQuery(e.target.value); setActive(-1); }}
            onKeyDown={onKeyDown}
            placeholder="a symptom, a part, a cause… e.g. “clicks when climbing”"
            className="rounded-md border border-ink-faint/50 bg-white px-3 py-2.5 text-lg shadow-inner"
          />
        </div>
        <p className="text-sm text-ink-faint" aria-live="polite" data-testid="search-status">
          {error ? `The write-up index could not be loaded: ${error.message}` : loading && !index ? "Loading the write-up index…" :
            index ? `${hits.length === 50 ? "50+" : hits.length} of ${index.size} write-ups${deferredQuery.trim() ? ` for “${deferredQuery.trim()}”` : filtered ? " with these filters" : ", newest first"} · ↑ ↓ to move, Enter to open` : ""}
        </p>
        {index && hits.length === 0 ? (
          <EmptyState title={deferredQuery.trim() ? `No write-up matches “${deferredQuery.trim()}”.` : "No published write-up matches these filters."}>
            Try fewer words, another spelling, or clear the filters.
          </EmptyState>
        ) : (
          <SearchResults hits={hits} active={active} onHover={setActive} />
        )}
      </div>
    </div>
  );
}
