"use client";
import Link from "next/link";
import { useRef, useState } from "react";
import type { ImportPreview } from "@/lib/csv/preview";
import { ScrollRegion } from "@/components/ui/scroll-region";

type Stage =
  | { kind: "idle" }
  | { kind: "checking" }
  | { kind: "checked"; file: File; preview: ImportPreview }
  | { kind: "importing"; file: File; preview: ImportPreview }
  | { kind: "done"; imported: number; skipped: number }
  | { kind: "failed"; message: string; file?: File; preview?: ImportPreview };

async function errorOf(response: Response): Promise<string> {
  const body = (await response.json().catch(() => null)) as { error?: string } | null;
  return body?.error ?? `The server answered ${response.status}.`;
}

/**
 * Upload → preview (each problem with its line, column and reason) → an explicit "import N, skip M"
 * or pick a corrected file. The browser keeps the file; the server keeps nothing between the two steps.
 */
export function ImportPanel() {
  const [stage, setStage] = useState<Stage>({ kind: "idle" });
  const input = useRef<HTMLInputElement>(null);

  async function check(file: File) {
    setStage({ kind: "checking" });
    const body = new FormData();
    body.set("file", file);
    const response = await fetch("/api/imports/preview", { method: "POST", body }).catch(() => null);
    if (!response) return setStage({ kind: "failed", message: "The file did not reach the server; try again." });
    if (!response.ok) return setStage({ kind: "failed", message: await errorOf(response) });
    setStage({ kind: "checked", file, preview: (await response.json()) as ImportPreview });
  }

  async function confirm(file: File, preview: ImportPreview) {
    setStage({ kind: "importing", file, preview });
    const body = new FormData();
    body.set("file", file);
    body.set("token", preview.token ?? "");
    body.set("valid", String(preview.valid));
    body.set("skipped", String(preview.skipped));
    const response = await fetch("/api/imports", { method: "POST", body }).catch(() => null);
    if (!response) return setStage({ kind: "failed", message: "The import did not reach the server; nothing was imported.", file, preview });
    if (!response.ok) return setStage({ kind: "failed", message: await errorOf(response), file, preview });
    const result = (await response.json()) as { imported: number; skipped: number };
    setStage({ kind: "done", ...result });
  }

  const preview = stage.kind === "checked" || stage.kind === "importing" ? stage.preview : stage.kind === "failed" ? stage.preview : undefined;
  const file = stage.kind === "checked" || stage.kind === "importing" ? stage.file : stage.kind === "failed" ? stage.file : undefined;

  return (
    <div className="flex flex-col gap-4" data-testid="import-panel">
      <div className="flex flex-col gap-1">
        <label htmlFor="import-file" className="text-sm font-medium text-ink-soft">CSV file of past repairs (UTF-8, up to 2 MB)</label>
        <input
          ref={input}
          id="import-file"
          type="file"
          accept=".csv,text/csv"
          disabled={stage.kind === "checking" || stage.kind === "importing"}
          onChange={(e) => {
            const chosen = e.target.files?.[0];
            if (chosen) void check(chosen);
          }}
          className="text-sm"
        />
      </div>

      <div aria-live="polite" className="flex flex-col gap-3">
        {stage.kind === "checking" ? <p className="text-sm text-ink-soft">Checking every row…</p> : null}
        {stage.kind === "failed" ? <p className="text-sm text-danger" role="alert">{stage.message}</p> : null}
        {stage.kind === "done" ? (
          <div className="rounded-md border border-moss/40 bg-moss-light p-3 text-sm" data-testid="import-done">
            <p className="font-medium">Imported {stage.imported} record{stage.imported === 1 ? "" : "s"} as closed cases{stage.skipped ? `; ${stage.skipped} skipped` : ""}.</p>
            <p>They count in the reports from now on. <Link href="/reports?last=24">Open the reports</Link></p>
          </div>
        ) : null}

        {preview ? (
          <div className="flex flex-col gap-3" data-testid="import-preview">
            <p className="text-sm">
              <span className="font-medium">{preview.fileName}</span>: {preview.total} row{preview.total === 1 ? "" : "s"},{" "}
              <span className="text-moss">{preview.valid} ready to import</span>,{" "}
              <span className={preview.skipped ? "text-danger" : ""}>{preview.skipped} with problems</span>.
              {preview.unusedColumns.length ? ` Columns not used: ${preview.unusedColumns.join(", ")}.` : ""}
            </p>
            {preview.problems.length ? (
              <ScrollRegion label="Problems found in the file" className="max-h-80 overflow-y-auto rounded-md border border-ink-faint/30">
                <table className="w-full text-left text-sm" data-testid="import-problems">
                  <caption className="sr-only">Problems found in the file</caption>
                  <thead className="sticky top-0 bg-paper-deep text-xs uppercase tracking-wide text-ink-faint">
                    <tr><th scope="col" className="px-2 py-1.5 text-right">Line</th><th scope="col" className="px-2 py-1.5">Column</th><th scope="col" className="px-2 py-1.5">Problem</th></tr>
                  </thead>
                  <tbody>
                    {preview.problems.map((p, i) => (
                      <tr key={i} className="border-t border-ink-faint/15">
                        <td className="px-2 py-1 text-right font-mono">{p.line}</td>
                        <td className="px-2 py-1 font-mono text-xs">{p.column || "—"}</td>
                        <td className="px-2 py-1">{p.message}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
                {preview.problemCount > preview.problems.length ? <p className="p-2 text-xs text-ink-faint">…and {preview.problemCount - preview.problems.length} more.</p> : null}
              </ScrollRegion>
            ) : null}
            <div className="flex flex-wrap items-center gap-3">
              {preview.valid > 0 && preview.token && file ? (
                <button
                  type="button"
                  disabled={stage.kind === "importing"}
                  onClick={() => void confirm(file, preview)}
                  className="rounded-md bg-copper px-4 py-2 font-medium text-white shadow-sm hover:bg-copper-dark disabled:opacity-60"
                >
                  {stage.kind === "importing" ? "Importing…" : preview.skipped ? `Import the ${preview.valid} valid rows and skip ${preview.skipped}` : `Import all ${preview.valid} rows`}
                </button>
              ) : <p className="text-sm text-ink-soft">Nothing in this file can be imported yet.</p>}
              <button type="button" onClick={() => input.current?.click()} className="rounded-md border border-ink-soft px-4 py-2 font-medium hover:bg-paper-deep">
                Choose a corrected file
              </button>
            </div>
          </div>
        ) : null}
      </div>
    </div>
  );
}
