"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import type { ActionState } from "@/lib/actions/define";

type ModeSet = ActionState<{ treeId: number; mode: string }>;

/** The tree setting: score triage with the authored strengths or with the likelihoods learned from closed cases. */
export function LikelihoodModeForm({ treeId, mode, action }: {
  treeId: number;
  mode: "authored" | "learned";
  action: (prev: ModeSet, form: FormData) => Promise<ModeSet>;
}) {
  const [state, formAction, pending] = useActionState<ModeSet, FormData>(action, null);
  return (
    <form action={formAction} className="flex flex-col gap-1">
      <input type="hidden" name="treeId" value={treeId} />
      <fieldset className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm" disabled={pending}>
        <legend className="mb-1 font-medium">Triage on this tree scores with</legend>
        {(["authored", "learned"] as const).map((m) => (
          <label key={m} className="flex items-center gap-1.5">
            <input type="radio" name="mode" value={m} defaultChecked={mode === m} onChange={(e) => e.currentTarget.form?.requestSubmit()} />
            {m === "authored" ? "the strengths written in the tree" : "likelihoods learned from closed cases"}
          </label>
        ))}
        <noscript><button type="submit" className="rounded-md border px-2 py-1">Save</button></noscript>
      </fieldset>
      <FormMessage state={state} />
    </form>
  );
}
