"use client";
import { useActionState, useState, useTransition } from "react";
import { FormMessage } from "@/components/ui/form-message";
import type { ActionState } from "@/lib/actions/define";
import type { OutcomeSaved } from "@/lib/outcomes/actions";
import { OUTCOME_LIMITS } from "@/lib/outcomes/input";
import { UPGRADES } from "@/lib/survival/upgrades";
import { CauseRows, type CauseRow } from "./cause-rows";
import { FieldError } from "./field-error";
import { PartRows, type PartRow } from "./part-rows";
import type { CauseChoice, FormAction, OutcomeDraft, PartChoice } from "./types";

const inputClass = (error?: string) => `rounded-md border bg-white px-3 py-2 ${error ? "border-danger" : "border-ink-faint/50"}`;

/** The bench outcome form; rows and choices live in state so a refused save keeps everything typed. */
export function OutcomeForm({ caseId, initial, causes, parts, ranked, action, photos }: {
  caseId: number;
  /** Rendered inside the form, so its "remove on save" boxes travel with the save. */
  photos?: React.ReactNode;
  initial: OutcomeDraft;
  causes: CauseChoice[];
  parts: PartChoice[];
  ranked: number[];
  action: FormAction<OutcomeSaved>;
}) {
  const [state, formAction] = useActionState<ActionState<OutcomeSaved>, FormData>(action, null);
  const [pending, startTransition] = useTransition();
  const [causeRows, setCauseRows] = useState<CauseRow[]>(() =>
    initial.causes.length ? initial.causes.map((c, i) => ({ key: i + 1, causeId: String(c.id) })) : [{ key: 1, causeId: "" }]);
  const initialPrimary = initial.causes.find((c) => c.primary);
  const [primary, setPrimary] = useState(initialPrimary ? String(initialPrimary.id) : initial.otherCause && initial.causes.length ? "other" : "");
  const [otherCause, setOtherCause] = useState(initial.otherCause);
  const [partRows, setPartRows] = useState<PartRow[]>(() =>
    initial.parts.length ? initial.parts.map((p, i) => ({ key: i + 1, partId: String(p.id), quantity: String(p.quantity) })) : [{ key: 1, partId: "", quantity: "1" }]);
  const [upgrades, setUpgrades] = useState(initial.upgrades);
  const [upgradeKinds, setUpgradeKinds] = useState<string[]>(initial.upgradeKinds);
  const [labour, setLabour] = useState(initial.labourMinutes ? String(initial.labourMinutes) : "");
  const [notes, setNotes] = useState(initial.notes);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};

  return (
    <form
      aria-label="Bench outcome"
      className="flex flex-col gap-5"
      onSubmit={(e) => {
        e.preventDefault();
        const submitter = (e.nativeEvent as SubmitEvent).submitter as HTMLButtonElement | null;
        const data = new FormData(e.currentTarget, submitter);
        startTransition(() => formAction(data));
      }}
    >
      <input type="hidden" name="caseId" value={caseId} />
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 font-medium">Confirmed cause(s)</legend>
        <CauseRows rows={causeRows} setRows={setCauseRows} primary={primary} setPrimary={setPrimary} catalogue={causes} ranked={ranked} errors={errors} />
        <FieldError id="causes-error" message={errors.causeId ?? errors.primaryCause} />
        <div className="mt-2 flex flex-col gap-1">
          <label htmlFor="other-cause" className="text-sm font-medium text-ink-soft">Cause not in the catalogue (optional)</label>
          <div className="flex flex-wrap items-center gap-2">
            <input
              id="other-cause"
              name="otherCause"
              value={otherCause}
              maxLength={OUTCOME_LIMITS.otherCause}
              onChange={(e) => setOtherCause(e.target.value)}
              aria-invalid={errors.otherCause ? true : undefined}
              aria-describedby={errors.otherCause ? "other-cause-error" : undefined}
              className={`min-w-0 flex-1 ${inputClass(errors.otherCause)}`}
              placeholder="What you found, in a few words"
            />
            <label className="flex items-center gap-1 text-sm text-ink-soft">
              <input type="radio" name="primaryCause" value="other" checked={primary === "other"} onChange={() => setPrimary("other")} />
              Primary
            </label>
          </div>
          <FieldError id="other-cause-error" message={errors.otherCause} />
        </div>
      </fieldset>

      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 font-medium">Parts replaced</legend>
        <PartRows rows={partRows} setRows={setPartRows} catalogue={parts} errors={errors} />
        <FieldError id="parts-error" message={errors.partId} />
      </fieldset>

      <fieldset className="flex flex-col gap-1">
        <legend className="mb-1 font-medium">Upgrades fitted</legend>
        <p className="text-xs text-ink-faint">Ticked upgrades are followed over time on the &ldquo;Does it last?&rdquo; report.</p>
        <div className="grid gap-1 sm:grid-cols-2">
          {UPGRADES.map((u) => (
            <label key={u.slug} className="flex items-center gap-2 text-sm">
              <input type="checkbox" name="upgradeKind" value={u.slug} checked={upgradeKinds.includes(u.slug)}
                onChange={(e) => setUpgradeKinds((k) => (e.target.checked ? [...k, u.slug] : k.filter((x) => x !== u.slug)))} />
              {u.name}
            </label>
          ))}
        </div>
        <FieldError id="upgrade-kind-error" message={errors.upgradeKind} />
      </fieldset>

      <div className="grid gap-4 md:grid-cols-[1fr_10rem]">
        <div className="flex flex-col gap-1">
          <label htmlFor="upgrades" className="text-sm font-medium text-ink-soft">Other upgrades or details (optional)</label>
          <input id="upgrades" name="upgrades" value={upgrades} maxLength={OUTCOME_LIMITS.upgrades} onChange={(e) => setUpgrades(e.target.value)}
            aria-invalid={errors.upgrades ? true : undefined} className={inputClass(errors.upgrades)} />
          <FieldError id="upgrades-error" message={errors.upgrades} />
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor="labour" className="text-sm font-medium text-ink-soft">Labour (minutes)</label>
          <input id="labour" name="labourMinutes" inputMode="numeric" value={labour} onChange={(e) => setLabour(e.target.value)}
            aria-invalid={errors.labourMinutes ? true : undefined} aria-describedby={errors.labourMinutes ? "labour-error" : undefined}
            className={inputClass(errors.labourMinutes)} />
          <FieldError id="labour-error" message={errors.labourMinutes} />
        </div>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor="outcome-notes" className="text-sm font-medium text-ink-soft">Notes</label>
        <textarea id="outcome-notes" name="notes" rows={4} value={notes} maxLength={OUTCOME_LIMITS.notes} onChange={(e) => setNotes(e.target.value)}
          aria-invalid={errors.notes ? true : undefined} className={inputClass(errors.notes)} />
        <FieldError id="notes-error" message={errors.notes} />
      </div>

      {photos ? <fieldset><legend className="mb-2 font-medium">Photos</legend>{photos}</fieldset> : null}

      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" name="intent" value="save" disabled={pending}
          className="rounded-md border border-copper px-4 py-2 font-medium text-copper-dark hover:bg-copper-light disabled:opacity-60">
          {pending ? "Saving…" : "Save outcome"}
        </button>
        <button type="submit" name="intent" value="close" disabled={pending}
          className="rounded-md bg-copper px-4 py-2 font-medium text-white shadow-sm hover:bg-copper-dark disabled:opacity-60">
          Save and close the case
        </button>
        <span className="text-xs text-ink-faint">Closing freezes the outcome; a senior mechanic can reopen it.</span>
      </div>
      <FormMessage state={state} />
    </form>
  );
}
