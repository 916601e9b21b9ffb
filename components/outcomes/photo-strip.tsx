"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";

export interface PhotoItem {
  id: string;
  originalName: string;
}

/**
 * Bench photos of a case. New photos go straight to POST /api/uploads (linked to the case); ticking
 * "remove" takes a photo off the case when the outcome is saved.
 */
export function PhotoStrip({ caseId, photos, editable }: { caseId: number; photos: PhotoItem[]; editable: boolean }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [problems, setProblems] = useState<string[]>([]);

  async function upload(files: FileList) {
    setBusy(true);
    const failed: string[] = [];
    for (const file of Array.from(files)) {
      const body = new FormData();
      body.set("file", file);
      body.set("caseId", String(caseId));
      try {
        const response = await fetch("/api/uploads", { method: "POST", body });
        if (!response.ok) {
          const json = (await response.json().catch(() => null)) as { error?: string } | null;
          failed.push(`${file.name}: ${json?.error ?? `the server answered ${response.status}`}`);
        }
      } catch {
        failed.push(`${file.name}: the upload did not reach the server.`);
      }
    }
    setProblems(failed);
    setBusy(false);
    router.refresh();
  }

  return (
    <div className="flex flex-col gap-2">
      {photos.length === 0 ? <p className="text-sm text-ink-faint">No photos yet.</p> : (
        <ul className="flex flex-wrap gap-3">
          {photos.map((p) => (
            <li key={p.id} className="flex w-32 flex-col gap-1">
              <a href={`/api/uploads/${p.id}`} target="_blank" rel="noreferrer">
                {/* eslint-disable-next-line @next/next/no-img-element -- our own authenticated thumbnail route */}
                <img src={`/api/uploads/${p.id}/thumb`} alt={p.originalName} className="h-24 w-32 rounded border border-ink-faint/30 object-cover" />
              </a>
              {editable ? (
                <label className="flex items-center gap-1 text-xs text-ink-soft">
                  <input type="checkbox" name="detachPhotoId" value={p.id} /> Remove on save
                </label>
              ) : <span className="truncate text-xs text-ink-faint">{p.originalName}</span>}
            </li>
          ))}
        </ul>
      )}
      {editable ? (
        <div className="flex flex-col gap-1">
          <label htmlFor={`photos-${caseId}`} className="text-sm font-medium text-ink-soft">Add photos (JPEG, PNG or WebP, up to 10 MB each)</label>
          <input
            id={`photos-${caseId}`}
            type="file"
            accept="image/jpeg,image/png,image/webp"
            multiple
            disabled={busy}
            onChange={(e) => {
              if (e.target.files?.length) void upload(e.target.files);
              e.target.value = "";
            }}
            className="text-sm"
          />
          <p aria-live="polite" className="text-sm text-danger">{busy ? <span className="text-ink-soft">Uploading…</span> : problems.join(" ")}</p>
        </div>
      ) : null}
    </div>
  );
}
