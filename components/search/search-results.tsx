"use client";
import Link from "next/link";
import { snippetAround } from "@/lib/search/highlight";
import type { WriteupHit } from "@/lib/search/writeup-index";
import { Highlighted } from "./highlighted";

export const RESULTS_ID = "writeup-results";

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

export function SearchResults({ hits, onLeaveTop }: { hits: WriteupHit[]; onLeaveTop: () => void }) {
  return (
    <ul id={RESULTS_ID} aria-label="Matching write-ups" className="flex flex-col gap-2" data-testid="search-results" onKeyDown={(e) => moveFocus(e, onLeaveTop)}>
      {hits.map((hit) => {
        const snippet = hit.fields.includes("body") ? snippetAround(hit.doc.text, hit.terms) : null;
        return (
          <li
            key={hit.doc.id}
            className="rounded-lg border border-ink-faint/30 bg-white p-3 shadow-sm focus-within:border-copper focus-within:ring-2 focus-within:ring-copper/30"
          >
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
      })}
    </ul>
  );
}
