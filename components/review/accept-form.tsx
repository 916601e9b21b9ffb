"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import type { ActionState } from "@/lib/actions/define";
import type { AcceptedSuggestion } from "@/lib/review/actions";

type Accept = (prev: ActionState<AcceptedSuggestion>, form: FormData) => Promise<ActionState<AcceptedSuggestion>>;

export function AcceptSuggestionForm({ treeId, versionId, optionKey, causeSlug, label, action }: {
  treeId: number;
  versionId: number;
  optionKey: string;
  causeSlug: string;
  label: string;
  action: Accept;
}) {
  const [state, formAction] = useActionState<ActionState<AcceptedSuggestion>, FormData>(action, null);
  return (
    <form action={formAction} className="flex flex-wrap items-center gap-3">
      <input type="hidden" name="treeId" value={treeId} />
      <input type="hidden" name="versionId" value={versionId} />
      <input type="hidden" name="optionKey" value={optionKey} />
      <input type="hidden" name="causeSlug" value={causeSlug} />
      <SubmitButton pendingText="Writing to the draft…" className="px-3 py-1 text-sm">{label}</SubmitButton>
      <FormMessage state={state} />
    </form>
  );
}
