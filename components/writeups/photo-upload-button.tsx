"use client";
import { useRef, useState } from "react";

interface Uploaded {
  id: string;
  markdown: string;
}

/** Sends one photo to POST /api/uploads and hands back the Markdown line that shows it. */
export function PhotoUploadButton({ writeupId, onUploaded }: { writeupId?: number; onUploaded: (markdown: string) => void }) {
  const input = useRef<HTMLInputElement>(null);
  const [status, setStatus] = useState<{ kind: "idle" | "busy" | "done" | "error"; text: string }>({ kind: "idle", text: "" });

  async function upload(file: File) {
    setStatus({ kind: "busy", text: `Uploading ${file.name}…` });
    const form = new FormData();
    form.set("file", file);
    if (writeupId) form.set("writeupId", String(writeupId));
    try {
      const response = await fetch("/api/uploads", { method: "POST", body: form, credentials: "same-origin" });
      const body = (await response.json().catch(() => ({}))) as Partial<Uploaded> & { error?: string };
      if (!response.ok || !body.markdown) throw new Error(body.error ?? `The upload failed (${response.status}).`);
      onUploaded(body.markdown);
      setStatus({ kind: "done", text: `${file.name} added to the text.` });
    } catch (error) {
      setStatus({ kind: "error", text: error instanceof Error ? error.message : "The upload failed." });
    } finally {
      if (input.current) input.current.value = "";
    }
  }

  return (
    <div className="flex flex-wrap items-center gap-3">
      <input
        ref={input}
        type="file"
        accept="image/jpeg,image/png,image/webp"
        className="sr-only"
        id="writeup-photo-input"
        data-testid="photo-input"
        onChange={(e) => { const file = e.target.files?.[0]; if (file) void upload(file); }}
      />
      <label
        htmlFor="writeup-photo-input"
        className="cursor-pointer rounded-md border border-ink-faint/50 bg-white px-3 py-1.5 text-sm font-medium hover:bg-paper"
      >
        Add photo
      </label>
      <span className="text-xs text-ink-faint">JPEG, PNG or WebP, up to 10 MB</span>
      <p aria-live="polite" role="status" data-testid="photo-status" className={`text-sm ${status.kind === "error" ? "text-danger" : "text-ink-soft"}`}>
        {status.text}
      </p>
    </div>
  );
}
