"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import type { ActionState } from "@/lib/actions/define";

type Saved = ActionState<{ months: number }>;

/** The shop's warranty period; only shown to those who may change settings (the server checks again). */
export function WarrantyForm({ months, action }: { months: number; action: (prev: Saved, form: FormData) => Promise<Saved> }) {
  const [state, formAction] = useActionState<Saved, FormData>(action, null);
  const error = state && !state.ok ? state.fieldErrors?.months : undefined;
  return (
    <form action={formAction} aria-label="Warranty period" className="flex flex-wrap items-end gap-3">
      <label className="flex flex-col gap-1 text-sm font-medium text-ink-soft">
        Warranty on a repair (months)
        <input name="months" inputMode="numeric" defaultValue={state?.ok ? state.data.months : months} aria-invalid={error ? true : undefined}
          className={`w-24 rounded-md border bg-white px-3 py-2 font-normal text-ink ${error ? "border-danger" : "border-ink-faint/50"}`} />
      </label>
      <SubmitButton pendingText="Saving…">Save</SubmitButton>
      <FormMessage state={state} />
    </form>
  );
}
