"use client";
import Link from "next/link";
import { snippetAround } from "@/lib/search/highlight";
import type { WriteupHit } from "@/lib/search/writeup-index";
import { Highlighted } from "./highlighted";

export const resultId = (id: number) => `writeup-result-${id}`;

export function SearchResults({ hits, active, onHover }: { hits: WriteupHit[]; active: number; onHover: (i: number) => void }) {
  return (
    <ul id="writeup-results" role="listbox" aria-label="Matching write-ups" className="flex flex-col gap-2" data-testid="search-results">
      {hits.map((hit, i) => {
        const snippet = hit.fields.includes("body") ? snippetAround(hit.doc.text, hit.terms) : null;
        return (
          <li
            key={hit.doc.id}
            id={resultId(hit.doc.id)}
            role="option"
            aria-selected={i === active}
            onMouseEnter={() => onHover(i)}
            className={`rounded-lg border bg-white p-3 shadow-sm ${i === active ? "border-copper ring-2 ring-copper/30" : "border-ink-faint/30"}`}
          >
            <Link href={`/writeups/${hit.doc.id}`} className="text-base font-semibold text-ink no-underline hover:text-copper-dark" tabIndex={-1}>
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
