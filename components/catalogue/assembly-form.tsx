"use client";
import { useActionState } from "react";
import { Field, SelectField } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import type { ActionState } from "@/lib/actions/define";
import type { StageInfo } from "@/lib/bench/types";

type Saved = ActionState<{ family: string }>;
type Action = (prev: Saved, form: FormData) => Promise<Saved>;

const CAUTIONS = [
  { value: "none", label: "No standing caution" },
  { value: "power", label: "Battery out, power off" },
  { value: "press", label: "Press work" },
];

/** Edit one stage of a family's unit, or add a new one (no `stage`). */
export function AssemblyForm({ family, stage, stages, save, remove }: {
  family: string;
  stage?: StageInfo;
  stages: StageInfo[];
  save: Action;
  remove?: Action;
}) {
  const [state, action] = useActionState(save, null);
  const [removed, removeAction] = useActionState(remove ?? save, null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  const parents = [{ value: "", label: "None: the unit as received" }, ...stages.filter((s) => s.slug !== stage?.slug).map((s) => ({ value: s.slug, label: s.name }))];
  return (
    <div className="flex flex-col gap-2" data-testid="assembly-form" data-stage={stage?.slug ?? "new"}>
      <form action={action} className="grid gap-3 sm:grid-cols-3 sm:items-end [&_input]:min-w-0 [&_select]:min-w-0">
        <input type="hidden" name="family" value={family} />
        <input type="hidden" name="originalSlug" value={stage?.slug ?? ""} />
        <Field label="Name" name="name" defaultValue={stage?.name ?? ""} error={errors.name} required />
        <Field label="Key" name="slug" defaultValue={stage?.slug ?? ""} readOnly={!!stage} error={errors.slug} required />
        <SelectField label="Inside" name="parent" defaultValue={stage?.parent ?? ""} options={parents} error={errors.parent} />
        <Field label="Open (min)" name="openMinutes" inputMode="numeric" defaultValue={String(stage?.openMinutes ?? 10)} error={errors.openMinutes} />
        <Field label="Close (min)" name="closeMinutes" inputMode="numeric" defaultValue={String(stage?.closeMinutes ?? 10)} error={errors.closeMinutes} />
        <SelectField label="Caution" name="caution" defaultValue={stage?.caution ?? "none"} options={CAUTIONS} error={errors.caution} />
        <div className="sm:col-span-3"><SubmitButton pendingText="Saving…">{stage ? "Save" : "Add stage"}</SubmitButton></div>
      </form>
      <div className="flex flex-wrap items-center gap-3">
        <FormMessage state={state} />
        {stage && remove ? (
          <form action={removeAction} className="flex items-center gap-2">
            <input type="hidden" name="family" value={family} />
            <input type="hidden" name="slug" value={stage.slug} />
            <button type="submit" className="text-sm text-danger underline">Remove this stage</button>
            <FormMessage state={removed} />
          </form>
        ) : null}
      </div>
    </div>
  );
}
