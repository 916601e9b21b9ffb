"use client";
import { useActionState } from "react";
import { discardDraft, startDraft } from "@/app/(shop)/trees/actions";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";

export function StartDraftForm({ treeId, fromNumber }: { treeId: number; fromNumber: number | null }) {
  const [state, action] = useActionState(startDraft, null);
  return (
    <form action={action} className="flex flex-wrap items-center gap-3">
      <input type="hidden" name="treeId" value={treeId} />
      <SubmitButton pendingText="Copying…">{fromNumber ? `Start a new draft from version ${fromNumber}` : "Start a draft"}</SubmitButton>
      <FormMessage state={state} />
    </form>
  );
}

export function DiscardDraftForm({ versionId, number, onlyVersion }: { versionId: number; number: number; onlyVersion: boolean }) {
  const [state, action] = useActionState(discardDraft, null);
  return (
    <details className="text-sm">
      <summary className="cursor-pointer text-danger">Discard draft {number}…</summary>
      <form action={action} className="mt-2 flex flex-wrap items-center gap-3 rounded border border-danger/40 bg-danger-light/40 p-2">
        <input type="hidden" name="versionId" value={versionId} />
        <p className="text-xs text-ink">{onlyVersion ? "This tree has never been published, so the tree goes too." : "The published versions stay as they are."} This cannot be undone.</p>
        <button type="submit" className="rounded bg-danger px-3 py-1 text-xs font-medium text-white">Discard for good</button>
        <FormMessage state={state} />
      </form>
    </details>
  );
}
