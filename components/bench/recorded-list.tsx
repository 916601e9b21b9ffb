"use client";
import type { FindingResult } from "@/db/schema";
import type { RankedCause } from "@/lib/bench/types";

const LABEL: Record<FindingResult, string> = { found: "Found", not_found: "Not found", not_done: "Not done" };
const OTHER: Record<FindingResult, FindingResult[]> = { found: ["not_found", "not_done"], not_found: ["found", "not_done"], not_done: ["found", "not_found"] };

/** Inspections already recorded, with their photo; a result can be corrected. */
export function RecordedList({ ranking, photos, canRecord, busy, onRecord }: {
  ranking: RankedCause[];
  photos: Record<string, string>;
  canRecord: boolean;
  busy: boolean;
  onRecord: (cause: string, result: FindingResult, photo: File | null) => void;
}) {
  const done = ranking.filter((r) => r.result);
  if (done.length === 0) return <p className="text-sm text-ink-soft">Nothing recorded yet.</p>;
  return (
    <ul className="flex flex-col gap-3" data-testid="recorded">
      {done.map((r) => (
        <li key={r.slug} data-testid="recorded-finding" data-cause={r.slug} data-result={r.result} className="flex flex-wrap items-center gap-3">
          {photos[r.slug] ? (
            <a href={`/api/uploads/${photos[r.slug]}`} target="_blank" rel="noreferrer">
              {/* eslint-disable-next-line @next/next/no-img-element -- our own authenticated thumbnail route */}
              <img src={`/api/uploads/${photos[r.slug]}/thumb`} alt={`Photo: ${r.name}`} data-testid="finding-thumb" className="h-14 w-20 rounded border border-ink-faint/30 object-cover" />
            </a>
          ) : null}
          <div className="min-w-0 flex-1">
            <p className="text-sm font-medium">{r.name}</p>
            <p className={`text-xs ${r.result === "found" ? "font-semibold text-moss" : "text-ink-soft"}`}>{LABEL[r.result!]}</p>
          </div>
          {canRecord ? (
            <div className="flex gap-1">
              {OTHER[r.result!].map((o) => (
                <button key={o} type="button" disabled={busy} onClick={() => onRecord(r.slug, o, null)}
                  className="rounded border border-ink-faint/40 px-2 py-1 text-xs hover:bg-paper-deep disabled:opacity-60">
                  {LABEL[o]}
                </button>
              ))}
            </div>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
