"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import type { ActionState } from "@/lib/actions/define";
import type { StageInfo } from "@/lib/bench/types";

type Saved = ActionState<{ family: string }>;

/** Where one cause is inspected in the family's unit, and for how long. */
export function LocationForm({ family, cause, name, stage, inspectMinutes, stages, save }: {
  family: string;
  cause: string;
  name: string;
  stage: string;
  inspectMinutes: number;
  stages: StageInfo[];
  save: (prev: Saved, form: FormData) => Promise<Saved>;
}) {
  const [state, action] = useActionState(save, null);
  return (
    <form action={action} className="grid grid-cols-[minmax(0,1fr)_auto] items-center gap-2 border-b border-ink-faint/20 py-2 sm:grid-cols-[minmax(0,2fr)_minmax(0,2fr)_6rem_auto]" data-testid="location-form" data-cause={cause}>
      <input type="hidden" name="family" value={family} />
      <input type="hidden" name="cause" value={cause} />
      <span className="text-sm">{name}</span>
      <select name="stage" defaultValue={stage} aria-label={`Stage where ${name} is inspected`} className="rounded-md border border-ink-faint/50 bg-white px-2 py-1.5 text-sm">
        {stages.map((s) => <option key={s.slug} value={s.slug}>{s.name}</option>)}
      </select>
      <input name="inspectMinutes" inputMode="numeric" defaultValue={String(inspectMinutes)} aria-label={`Inspection minutes for ${name}`}
        className="rounded-md border border-ink-faint/50 bg-white px-2 py-1.5 text-sm" />
      <div className="flex items-center gap-2">
        <button type="submit" className="rounded-md border border-copper px-3 py-1.5 text-sm text-copper-dark hover:bg-paper-deep">Save</button>
        <FormMessage state={state} />
      </div>
    </form>
  );
}
