"use client";
import { useRef, useState } from "react";
import type { FindingResult } from "@/db/schema";

const BUTTONS: { result: FindingResult; label: string; className: string }[] = [
  { result: "found", label: "Found", className: "bg-copper text-white hover:bg-copper-dark" },
  { result: "not_found", label: "Not found", className: "bg-white border border-ink-faint/60 hover:bg-paper-deep" },
  { result: "not_done", label: "Not done", className: "bg-white border border-ink-faint/40 text-ink-soft hover:bg-paper-deep" },
];

/** Found / not found / not done for one inspection, with an optional photo sent along. */
export function FindingControls({ cause, name, busy, onRecord }: {
  cause: string;
  name: string;
  busy: boolean;
  onRecord: (cause: string, result: FindingResult, photo: File | null) => void;
}) {
  const fileRef = useRef<HTMLInputElement>(null);
  const [photoName, setPhotoName] = useState("");
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap gap-2" role="group" aria-label={`Result of: ${name}`}>
        {BUTTONS.map((b) => (
          <button
            key={b.result}
            type="button"
            disabled={busy}
            data-testid={`record-${b.result}`}
            className={`min-h-11 rounded-md px-4 py-2 font-medium disabled:opacity-60 ${b.className}`}
            onClick={() => onRecord(cause, b.result, fileRef.current?.files?.[0] ?? null)}
          >
            {b.label}
          </button>
        ))}
      </div>
      <label className="flex flex-wrap items-center gap-2 text-sm text-ink-soft">
        <span>Photo (optional)</span>
        <input
          ref={fileRef}
          type="file"
          accept="image/jpeg,image/png,image/webp"
          capture="environment"
          data-testid="finding-photo"
          className="max-w-full text-sm"
          onChange={(e) => setPhotoName(e.target.files?.[0]?.name ?? "")}
        />
        {photoName ? <span className="sr-only">{photoName} chosen</span> : null}
      </label>
    </div>
  );
}
