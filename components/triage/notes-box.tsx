"use client";
import { useEffect, useRef, useState, useTransition } from "react";
import { saveNotes } from "@/app/(shop)/triage/actions";

const DEBOUNCE_MS = 700;

/** Case notes that save themselves a moment after the technician stops typing. */
export function NotesBox({ caseId, initial }: { caseId: number; initial: string }) {
  const [value, setValue] = useState(initial);
  const [status, setStatus] = useState<{ kind: "idle" | "saving" | "saved" | "error"; text: string }>({ kind: "idle", text: "Notes save as you type." });
  const [, startTransition] = useTransition();
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const lastSaved = useRef(initial);

  useEffect(() => () => { if (timer.current) clearTimeout(timer.current); }, []);

  function save(text: string) {
    if (text === lastSaved.current) return;
    setStatus({ kind: "saving", text: "Saving…" });
    startTransition(async () => {
      const form = new FormData();
      form.set("caseId", String(caseId));
      form.set("notes", text);
      const result = await saveNotes(null, form);
      if (result?.ok) {
        lastSaved.current = text;
        setStatus({ kind: "saved", text: `Saved at ${new Date(result.data.savedAt).toLocaleTimeString([], { hour: "2-digit", minute: "2-digit", second: "2-digit" })}` });
      } else {
        setStatus({ kind: "error", text: result?.error ?? "Not saved." });
      }
    });
  }

  return (
    <div className="flex flex-col gap-1">
      <label htmlFor="case-notes" className="sr-only">Case notes</label>
      <textarea id="case-notes" value={value} rows={5} data-testid="case-notes"
        onChange={(e) => {
          const text = e.target.value;
          setValue(text);
          if (timer.current) clearTimeout(timer.current);
          timer.current = setTimeout(() => save(text), DEBOUNCE_MS);
        }}
        onBlur={() => { if (timer.current) clearTimeout(timer.current); save(value); }}
        className="rounded-md border border-ink-faint/50 bg-white px-3 py-2 shadow-inner" />
      <p aria-live="polite" data-testid="notes-status" className={`text-xs ${status.kind === "error" ? "text-danger" : "text-ink-faint"}`}>{status.text}</p>
    </div>
  );
}
