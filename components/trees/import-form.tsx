"use client";
import { useActionState } from "react";
import { importTree } from "@/app/(shop)/trees/actions";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";

export function ImportTreeForm() {
  const [state, action] = useActionState(importTree, null);
  const problems = state && !state.ok ? Object.entries(state.fieldErrors ?? {}) : [];
  return (
    <form action={action} className="flex flex-col gap-3" aria-label="Import a tree file">
      <label className="flex flex-col gap-1 text-sm font-medium text-ink-soft">
        Tree file (JSON)
        <input type="file" name="file" accept="application/json,.json" className="text-sm font-normal text-ink" />
      </label>
      <label className="flex items-start gap-2 text-sm">
        <input type="checkbox" name="asNewDraft" className="mt-1" />
        <span>If a tree with the file&apos;s slug exists, import the file as a new draft of that tree</span>
      </label>
      <div className="flex items-center gap-4">
        <SubmitButton pendingText="Checking…">Check and import</SubmitButton>
        <FormMessage state={state} />
      </div>
      {problems.length ? (
        <div role="alert" className="rounded-md border border-danger/40 bg-danger-light/50 p-3" data-testid="import-problems">
          <p className="text-sm font-medium text-danger">Problems in the file, by JSON path:</p>
          <ul className="mt-1 max-h-64 overflow-y-auto text-sm">
            {problems.map(([path, message]) => (
              <li key={path} className="py-0.5"><code className="rounded bg-white px-1 font-mono text-xs">{path === "file" ? "(whole file)" : path}</code> {message}</li>
            ))}
          </ul>
        </div>
      ) : null}
      <p className="text-xs text-ink-faint">The format is documented with the app (lib/trees/file/format.md); any tree&apos;s page exports one to start from.</p>
    </form>
  );
}
