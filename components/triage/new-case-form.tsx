"use client";
import { useActionState, useState } from "react";
import { startCase } from "@/app/(shop)/triage/actions";
import { Field, SelectField } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { Panel } from "@/components/ui/panel";
import { SubmitButton } from "@/components/ui/submit-button";
import type { ActionState } from "@/lib/actions/define";
import type { FamilyChoice, TreeChoice } from "@/lib/cases/queries";

const RIDING = [
  { value: "road", label: "Road" }, { value: "trail", label: "Trail" }, { value: "cargo", label: "Cargo" }, { value: "commuting", label: "Commuting" },
];

/** Caller, unit and symptom; the trees offered are those published for the chosen motor family. */
export function NewCaseForm({ families, trees }: { families: FamilyChoice[]; trees: TreeChoice[] }) {
  const [state, action] = useActionState<ActionState<{ id: number; reference: string }>, FormData>(startCase, null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  const fields = state && !state.ok ? state.fields ?? {} : {};
  const [familyId, setFamilyId] = useState(fields.familyId ?? "");
  const [treeVersionId, setTreeVersionId] = useState(fields.treeVersionId ?? "");
  const matching = familyId ? trees.filter((t) => t.familyIds.length === 0 || t.familyIds.includes(Number(familyId))) : [];

  return (
    <form action={action} noValidate className="flex flex-col gap-6" data-testid="new-case-form">
      <Panel title="Caller">
        <div className="grid gap-4 md:grid-cols-2">
          <Field label="Caller's name" name="callerName" defaultValue={fields.callerName} error={errors.callerName} autoComplete="off" />
          <fieldset className="flex flex-col gap-1">
            <legend className="text-sm font-medium text-ink-soft">Calling as</legend>
            <div className="flex gap-4 pt-2">
              {(["rider", "dealer"] as const).map((k) => (
                <label key={k} className="flex items-center gap-2">
                  <input type="radio" name="callerKind" value={k} defaultChecked={(fields.callerKind ?? "rider") === k} />
                  {k === "rider" ? "Rider" : "Dealer"}
                </label>
              ))}
            </div>
            {errors.callerKind ? <p className="text-sm text-danger">{errors.callerKind}</p> : null}
          </fieldset>
          <Field label="Phone" name="phone" type="tel" defaultValue={fields.phone} error={errors.phone} hint="Digits, spaces and a leading + are fine." />
          <Field label="E-mail address" name="email" type="email" defaultValue={fields.email} error={errors.email} hint="The call summary goes here." />
        </div>
      </Panel>
      <Panel title="Unit">
        <div className="grid gap-4 md:grid-cols-3">
          <SelectField label="Motor family" name="familyId" value={familyId} error={errors.familyId}
            onChange={(e) => { setFamilyId(e.target.value); setTreeVersionId(""); }}
            options={[{ value: "", label: "Pick the motor family…" }, ...families.map((f) => ({ value: String(f.id), label: f.label }))]} />
          <Field label="Serial number" name="serial" defaultValue={fields.serial} error={errors.serial} hint="If the caller has it to hand." />
          <SelectField label="Riding use" name="ridingUse" defaultValue={fields.ridingUse ?? "road"} error={errors.ridingUse} options={RIDING} />
        </div>
      </Panel>
      <Panel title="Reported symptom">
        {!familyId ? <p className="text-ink-soft">Pick the motor family first; the symptoms listed are the trees published for it.</p> : matching.length === 0 ? (
          <p className="text-ink-soft">No published tree covers this motor family yet.</p>
        ) : (
          <fieldset className="grid gap-3 md:grid-cols-2" data-testid="tree-choices">
            <legend className="sr-only">Symptom tree</legend>
            {matching.map((t) => (
              <label key={t.versionId} className={`flex cursor-pointer gap-3 rounded-lg border-2 p-4 ${String(t.versionId) === treeVersionId ? "border-copper bg-copper-light/40" : "border-ink-faint/30 bg-white hover:border-copper/60"}`}>
                <input type="radio" name="treeVersionId" value={t.versionId} checked={String(t.versionId) === treeVersionId}
                  onChange={() => setTreeVersionId(String(t.versionId))} className="mt-1" />
                <span>
                  <span className="block text-lg font-semibold">{t.symptom}</span>
                  <span className="block text-sm text-ink-soft">{t.title}</span>
                </span>
              </label>
            ))}
          </fieldset>
        )}
        {errors.treeVersionId ? <p className="mt-2 text-sm text-danger">{errors.treeVersionId}</p> : null}
        <div className="mt-4 flex flex-col gap-1">
          <label htmlFor="caller-words" className="text-sm font-medium text-ink-soft">In the caller&apos;s words (optional, goes into the notes)</label>
          <textarea id="caller-words" name="callerWords" rows={2} defaultValue={fields.callerWords} className="rounded-md border border-ink-faint/50 bg-white px-3 py-2" />
        </div>
      </Panel>
      <div className="flex items-center gap-4">
        <SubmitButton pendingText="Starting…" className="px-6 py-3 text-lg">Start the walk</SubmitButton>
        <FormMessage state={state} />
      </div>
    </form>
  );
}
