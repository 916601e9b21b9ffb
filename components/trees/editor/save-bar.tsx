"use client";
import { useState } from "react";
import { clockTime } from "@/lib/format";
import { SmallButton } from "./inputs";

export interface SaveStatus {
  tone: "ok" | "error" | "info";
  text: string;
}

export function SaveBar({ number, revision, savedAt, dirty, saving, publishing, problemCount, status, onSave, onPublish, readOnly }: {
  number: number;
  revision: number;
  savedAt: string;
  dirty: boolean;
  saving: boolean;
  publishing: boolean;
  problemCount: number;
  status: SaveStatus | null;
  onSave: () => void;
  onPublish: (note: string) => void;
  readOnly: boolean;
}) {
  const [asking, setAsking] = useState(false);
  const [note, setNote] = useState("");
  const tone = status?.tone === "error" ? "text-danger" : status?.tone === "ok" ? "text-moss" : "text-ink-soft";
  return (
    <div className="flex flex-wrap items-center gap-3 rounded-lg border border-ink-faint/30 bg-white px-3 py-2">
      <div className="text-sm">
        <span className="font-semibold">{readOnly ? `Version ${number}` : `Draft ${number}`}</span>
        {!readOnly ? (
          <span className="text-ink-soft" data-testid="save-state">
            {" · "}{dirty ? <span className="font-medium text-amber">unsaved changes</span> : `saved ${clockTime(new Date(savedAt))}`}
            <span className="text-ink-faint"> · revision {revision}</span>
          </span>
        ) : <span className="text-ink-soft"> · published, read only</span>}
      </div>
      <p aria-live="polite" role="status" className={`min-h-5 flex-1 text-sm ${tone}`} data-testid="editor-status">{status?.text ?? ""}</p>
      {!readOnly ? (
        <div className="flex items-center gap-2">
          <SmallButton onClick={onSave} disabled={saving || publishing} title="Ctrl+S">{saving ? "Saving…" : "Save draft"}</SmallButton>
          {asking ? (
            <span className="flex items-center gap-2">
              <label className="sr-only" htmlFor="publish-note">What changed</label>
              <input id="publish-note" value={note} maxLength={500} onChange={(e) => setNote(e.target.value)} placeholder="What changed (optional)"
                className="w-56 rounded border border-ink-faint/50 px-2 py-1 text-sm" />
              <SmallButton tone="primary" disabled={publishing || problemCount > 0} onClick={() => onPublish(note)}>{publishing ? "Publishing…" : `Publish version ${number}`}</SmallButton>
              <SmallButton onClick={() => setAsking(false)}>Cancel</SmallButton>
            </span>
          ) : (
            <SmallButton tone="primary" disabled={problemCount > 0 || saving} onClick={() => setAsking(true)}
              title={problemCount ? `Fix ${problemCount} problem${problemCount === 1 ? "" : "s"} first` : "Freeze this draft as a published version"}>
              Publish…
            </SmallButton>
          )}
        </div>
      ) : null}
    </div>
  );
}

export function ConflictBanner({ message, onReload, onDownload, reloading }: { message: string; onReload: () => void; onDownload: () => void; reloading: boolean }) {
  return (
    <div role="alert" className="flex flex-wrap items-center gap-3 rounded-lg border border-danger/50 bg-danger-light px-3 py-2 text-sm" data-testid="conflict-banner">
      <p className="flex-1 text-danger">{message}</p>
      <SmallButton onClick={onDownload} title="Keep a copy of your edits as a tree file you can import later">Download my edits</SmallButton>
      <SmallButton tone="primary" onClick={onReload} disabled={reloading}>{reloading ? "Reloading…" : "Reload their version"}</SmallButton>
    </div>
  );
}
