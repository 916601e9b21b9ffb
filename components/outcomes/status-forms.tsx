"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import type { ActionState } from "@/lib/actions/define";
import { OUTCOME_LIMITS } from "@/lib/outcomes/input";
import type { FormAction } from "./types";

type Moved = { caseId: number };

export function StartBenchForm({ caseId, action }: { caseId: number; action: FormAction<Moved> }) {
  const [state, formAction] = useActionState<ActionState<Moved>, FormData>(action, null);
  return (
    <form action={formAction} className="flex flex-wrap items-center gap-3">
      <input type="hidden" name="caseId" value={caseId} />
      <SubmitButton pendingText="Moving…">The unit is on the bench</SubmitButton>
      <FormMessage state={state} />
    </form>
  );
}

export function ReopenForm({ caseId, action }: { caseId: number; action: FormAction<Moved> }) {
  const [state, formAction] = useActionState<ActionState<Moved>, FormData>(action, null);
  const error = state && !state.ok ? state.fieldErrors?.reason : undefined;
  return (
    <form action={formAction} className="flex flex-col gap-2 rounded-md border border-amber/40 bg-amber-light/40 p-3">
      <input type="hidden" name="caseId" value={caseId} />
      <label htmlFor={`reopen-${caseId}`} className="text-sm font-medium">Reopen this case: why?</label>
      <textarea id={`reopen-${caseId}`} name="reason" rows={2} maxLength={OUTCOME_LIMITS.reopenReason}
        defaultValue={state && !state.ok ? state.fields?.reason : ""}
        aria-invalid={error ? true : undefined} aria-describedby={error ? `reopen-${caseId}-error` : undefined}
        className={`rounded-md border bg-white px-3 py-2 ${error ? "border-danger" : "border-ink-faint/50"}`} />
      {error ? <p id={`reopen-${caseId}-error`} className="text-sm text-danger">{error}</p> : null}
      <div><SubmitButton pendingText="Reopening…">Reopen the case</SubmitButton></div>
      <FormMessage state={state} />
    </form>
  );
}
