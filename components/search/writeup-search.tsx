"use client";
import { useRouter, useSearchParams } from "next/navigation";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { EmptyState } from "@/components/ui/empty-state";
import type { SearchFilters } from "@/lib/search/types";
import { indexedTerm, MIN_PREFIX } from "@/lib/search/writeup-index";
import { SearchFilterPanel } from "./search-filters";
import { focusFirstResult, SearchResults } from "./search-results";
import { useWriteupIndex } from "./use-writeup-index";

/** How long typing must pause before the address follows the query. */
export const ADDRESS_AFTER_MS = 300;

function searchUrl(query: string, filters: SearchFilters): string {
  const params = new URLSearchParams();
  if (query.trim()) params.set("q", query.trim());
  for (const key of ["family", "cause", "tag"] as const) if (filters[key]) params.set(key, filters[key]!);
  const qs = params.toString();
  return qs ? `/writeups?${qs}` : "/writeups";
}

const param = (params: URLSearchParams, name: string) => params.get(name)?.slice(0, 200) || undefined;

/**
 * Search as you type over the published write-ups, with filters and arrow-key navigation. It starts
 * from the address (the query and filters it writes there), also when Back returns to it.
 */
export function WriteupSearch() {
  const router = useRouter();
  const params = useSearchParams();
  const { index, error, loading } = useWriteupIndex();
  const [query, setQuery] = useState(() => param(params, "q") ?? "");
  const [filters, setFilters] = useState<SearchFilters>(() => ({ family: param(params, "family"), cause: param(params, "cause"), tag: param(params, "tag") }));
  const input = useRef<HTMLInputElement>(null);
  // Found and painted with the keystroke itself: search and ten cards take a few milliseconds, and
  // deferring them (useDeferredValue) cost a frame that painted only the typed letter first.
  const hits = useMemo(() => (index ? index.search(query, filters) : []), [index, query, filters]);
  const facets = useMemo(() => index?.facets() ?? { families: [], causes: [], tags: [] }, [index]);

  // The address follows the query once typing pauses: each change of address also re-renders
  // Next's router and has the browser fetch the page's icons again, which took about as long as
  // the search itself on every keystroke.
  const address = searchUrl(query, filters);
  const addressTimer = useRef<number | undefined>(undefined);
  useEffect(() => {
    addressTimer.current = window.setTimeout(() => window.history.replaceState(null, "", address), ADDRESS_AFTER_MS);
    return () => window.clearTimeout(addressTimer.current);
  }, [address]);
  // Leaving for a result before the pause is over: the address is written first, so Back returns
  // to what was typed (the capture phase runs before the link's own navigation).
  const settleAddress = () => {
    window.clearTimeout(addressTimer.current);
    if (window.location.pathname + window.location.search !== address) window.history.replaceState(null, "", address);
  };
  const leaveResults = useCallback(() => input.current?.focus(), []);

  // ↓ moves into the result links (Tab reaches them too); Enter in the box opens the best match.
  function onKeyDown(e: React.KeyboardEvent<HTMLInputElement>) {
    if (e.key === "ArrowDown") { if (focusFirstResult()) e.preventDefault(); }
    else if (e.key === "Enter") {
      e.preventDefault();
      if (hits[0]) {
        settleAddress();
        router.push(`/writeups/${hits[0].doc.id}`);
      }
    } else if (e.key === "Escape") setQuery("");
  }

  const filtered = !!(filters.family || filters.cause || filters.tag);
  return (
    <div className="grid gap-6 md:grid-cols-[15rem_minmax(0,1fr)]">
      <aside className="md:pt-[4.5rem]"><SearchFilterPanel facets={facets} filters={filters} onChange={setFilters} /></aside>
      <div className="flex min-w-0 flex-col gap-3" onClickCapture={(e) => { if ((e.target as Element).closest("a[href]")) settleAddress(); }}>
        <div className="flex flex-col gap-1">
          <label htmlFor="writeup-search" className="text-sm font-medium text-ink-soft">Search write-ups</label>
          <input
            id="writeup-search"
            type="search"
            ref={input}
            aria-describedby="writeup-search-help"
            autoComplete="off"
            autoFocus
            value={query}
            onChange={(e) => setQuery(e.target.value)}
            onKeyDown={onKeyDown}
            placeholder="a symptom, a part, a cause… e.g. “clicks when climbing”"
            className="rounded-md border border-ink-faint/50 bg-white px-3 py-2.5 text-lg shadow-inner"
          />
          <p id="writeup-search-help" className="sr-only">Enter opens the best match; the down arrow moves into the results.</p>
        </div>
        <p className="text-sm text-ink-faint" aria-live="polite" data-testid="search-status">
          {error ? `The write-up index could not be loaded: ${error.message}` : loading && !index ? "Loading the write-up index…" :
            index ? `${hits.length === 50 ? "50+" : hits.length} of ${index.size} write-ups${query.trim() ? ` for “${query.trim()}”` : filtered ? " with these filters" : ", newest first"} · ↓ to move into the list, Enter to open` : ""}
        </p>
        {index && hits.length === 0 ? (
          <EmptyState title={query.trim() ? `No write-up matches “${query.trim()}”.` : "No published write-up matches these filters."}>
            {query.trim().split(/\s+/).some((word) => word.length > 0 && (word.length < MIN_PREFIX || indexedTerm(word) === null))
              ? "Words of one or two letters match only whole words, and common ones such as “to” or “the” none: keep typing, or clear the filters."
              : "Try fewer words, another spelling, or clear the filters."}
          </EmptyState>
        ) : (
          <SearchResults hits={hits} onLeaveTop={leaveResults} />
        )}
      </div>
    </div>
  );
}
