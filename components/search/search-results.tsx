"use client";
import Link from "next/link";
import { memo, useState } from "react";
import { snippetAround } from "@/lib/search/highlight";
import type { WriteupHit } from "@/lib/search/writeup-index";
import { Highlighted } from "./highlighted";

export const RESULTS_ID = "writeup-results";

/**
 * Cards painted at first, and added by each "Show more". Painting all fifty of a search's results
 * on every keystroke took most of the time from key to results at 10,000 write-ups, and a screen
 * shows fewer than ten.
 */
export const FIRST_RESULTS = 10;

/** Focuses the first result's link (from the search box's ↓ key). */
export function focusFirstResult(): boolean {
  const first = document.querySelector<HTMLAnchorElement>(`#${RESULTS_ID} a`);
  first?.focus();
  return !!first;
}

// ↑ and ↓ move between the result links; ↑ on the first goes back to the search box.
function moveFocus(e: React.KeyboardEvent<HTMLUListElement>, backTo: () => void) {
  if (e.key !== "ArrowDown" && e.key !== "ArrowUp") return;
  const links = Array.from(e.currentTarget.querySelectorAll<HTMLAnchorElement>("a"));
  const at = links.indexOf(document.activeElement as HTMLAnchorElement);
  if (at < 0) return;
  e.preventDefault();
  const next = e.key === "ArrowDown" ? Math.min(at + 1, links.length - 1) : at - 1;
  if (next < 0) backTo(); else links[next].focus();
}

/** The result cards. Memoised: a re-render of the page that leaves the results as they were leaves the cards alone. */
export const SearchResults = memo(function SearchResults({ hits, onLeaveTop }: { hits: WriteupHit[]; onLeaveTop: () => void }) {
  // Back to the first cards whenever the results change (state adjusted during rendering, as React advises).
  const [shown, setShown] = useState({ hits, count: FIRST_RESULTS });
  if (shown.hits !== hits) setShown({ hits, count: FIRST_RESULTS });
  const count = shown.hits === hits ? shown.count : FIRST_RESULTS;
  const more = hits.length - count;
  return (
    <div className="flex flex-col gap-3">
      <ul id={RESULTS_ID} aria-label="Matching write-ups" className="flex flex-col gap-2" data-testid="search-results" onKeyDown={(e) => moveFocus(e, onLeaveTop)}>
        {hits.slice(0, count).map((hit) => <ResultCard key={hit.doc.id} hit={hit} />)}
      </ul>
      {more > 0 ? (
        <button type="button" data-testid="search-more" onClick={() => setShown({ hits, count: count + FIRST_RESULTS })}
          className="self-start rounded-md border border-ink-faint/50 bg-white px-3 py-2 text-sm font-medium text-ink hover:border-copper">
          Show {Math.min(more, FIRST_RESULTS)} more
        </button>
      ) : null}
    </div>
  );
});

function ResultCard({ hit }: { hit: WriteupHit }) {
  const snippet = hit.fields.includes("body") ? snippetAround(hit.doc.text, hit.terms) : null;
  return (
    <li className="rounded-lg border border-ink-faint/30 bg-white p-3 shadow-sm focus-within:border-copper focus-within:ring-2 focus-within:ring-copper/30">
      <Link href={`/writeups/${hit.doc.id}`} className="text-base font-semibold text-ink no-underline hover:text-copper-dark hover:underline">
        <Highlighted text={hit.doc.title} terms={hit.terms} />
      </Link>
      <p className="mt-0.5 text-sm text-ink-soft"><Highlighted text={hit.doc.summary} terms={hit.terms} /></p>
      {snippet ? <p className="mt-1 text-xs text-ink-faint"><Highlighted text={snippet} terms={hit.terms} /></p> : null}
      <p className="mt-1.5 flex flex-wrap gap-x-3 gap-y-1 text-xs">
        {hit.doc.causes.map((c) => <span key={c} className="text-copper-dark"><Highlighted text={c} terms={hit.terms} /></span>)}
        {hit.doc.families.map((f) => <span key={f} className="text-moss"><Highlighted text={f} terms={hit.terms} /></span>)}
      </p>
    </li>
  );
}
