"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import type { ActionState } from "@/lib/actions/define";
import type { LikelihoodMode } from "@/lib/review/in-use";

type ModeSet = ActionState<{ treeId: number; mode: string }>;

const CHOICES: { mode: LikelihoodMode; label: string }[] = [
  { mode: "auto", label: "decide from the history (learned once there are enough closed cases)" },
  { mode: "authored", label: "always the strengths written in the tree" },
  { mode: "learned", label: "always the likelihoods learned from closed cases" },
];

/** The tree setting: let the history decide, or pin the authored strengths or the learned likelihoods. */
export function LikelihoodModeForm({ treeId, mode, action }: {
  treeId: number;
  mode: LikelihoodMode;
  action: (prev: ModeSet, form: FormData) => Promise<ModeSet>;
}) {
  const [state, formAction, pending] = useActionState<ModeSet, FormData>(action, null);
  return (
    <form action={formAction} className="flex flex-col gap-1">
      <input type="hidden" name="treeId" value={treeId} />
      <fieldset className="flex flex-col gap-1 text-sm" disabled={pending}>
        <legend className="mb-1 font-medium">Score triage on this tree with</legend>
        {CHOICES.map((c) => (
          <label key={c.mode} className="flex items-center gap-1.5">
            <input type="radio" name="mode" value={c.mode} defaultChecked={mode === c.mode} onChange={(e) => e.currentTarget.form?.requestSubmit()} />
            {c.label}
          </label>
        ))}
        <noscript><button type="submit" className="rounded-md border px-2 py-1">Save</button></noscript>
      </fieldset>
      <FormMessage state={state} />
    </form>
  );
}
