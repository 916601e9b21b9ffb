"use client";
import { useActionState, useState } from "react";
import { saveCause } from "@/app/(shop)/catalogue/actions";
import { Field, SelectField } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { AREA_LABELS } from "@/lib/catalogue/areas";
import { euros } from "@/lib/format";
import type { CauseWithParts, PartRow } from "@/lib/catalogue/queries";

const centsToInput = (c: number) => (c % 100 === 0 ? String(c / 100) : (c / 100).toFixed(2));

export function CauseForm({ cause, parts }: { cause: CauseWithParts | null; parts: PartRow[] }) {
  const [state, action] = useActionState(saveCause, null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  const f = state && !state.ok ? state.fields ?? {} : {};
  const [rows, setRows] = useState(() => (cause?.parts ?? []).map((p) => ({ slug: p.slug, quantity: String(p.quantity) })));
  const value = (name: string, fallback: string) => f[name] ?? fallback;
  const areaOptions = Object.entries(AREA_LABELS).map(([v, label]) => ({ value: v, label }));

  return (
    <form action={action} noValidate className="grid gap-4 md:grid-cols-2" aria-label={cause ? `Edit ${cause.name}` : "New cause"}>
      <input type="hidden" name="originalSlug" value={cause?.slug ?? ""} />
      <Field label="Name" name="name" defaultValue={value("name", cause?.name ?? "")} error={errors.name} />
      {cause ? (
        <>
          <input type="hidden" name="slug" value={cause.slug} />
          <Field label="Slug" name="slug-shown" value={cause.slug} readOnly disabled hint="Slugs stay as created: trees and learned evidence refer to them." />
        </>
      ) : (
        <Field label="Slug" name="slug" defaultValue={value("slug", "")} error={errors.slug} hint="Lower-case words joined by hyphens, unique in the catalogue." />
      )}
      <SelectField label="Area of the unit" name="area" defaultValue={value("area", cause?.area ?? "clutch")} options={areaOptions} error={errors.area} />
      <Field label="Torque rating (N·m, optional)" name="ratingNm" inputMode="numeric" defaultValue={value("ratingNm", cause?.ratingNm?.toString() ?? "")} error={errors.ratingNm} />
      <div className="flex flex-col gap-1 md:col-span-2">
        <label htmlFor="cause-description" className="text-sm font-medium text-ink-soft">Description</label>
        <textarea id="cause-description" name="description" rows={4} defaultValue={value("description", cause?.description ?? "")}
          className={`rounded-md border bg-white px-3 py-2 ${errors.description ? "border-danger" : "border-ink-faint/50"}`} aria-invalid={errors.description ? true : undefined} />
        {errors.description ? <p className="text-sm text-danger">{errors.description}</p> : null}
      </div>
      <Field label="Inspection time (minutes)" name="inspectMinutes" inputMode="numeric" defaultValue={value("inspectMinutes", String(cause?.inspectMinutes ?? 15))} error={errors.inspectMinutes} hint="Time to confirm or rule it out with the unit open; orders the bench plan." />
      <Field label="Typical labour (minutes)" name="labourMinutes" inputMode="numeric" defaultValue={value("labourMinutes", String(cause?.labourMinutes ?? 60))} error={errors.labourMinutes} />
      <Field label="Price from (EUR)" name="priceLow" inputMode="decimal" defaultValue={value("priceLow", cause ? centsToInput(cause.priceLowCents) : "")} error={errors.priceLow} />
      <Field label="Price to (EUR)" name="priceHigh" inputMode="decimal" defaultValue={value("priceHigh", cause ? centsToInput(cause.priceHighCents) : "")} error={errors.priceHigh} />
      <label className="flex items-center gap-2 text-sm md:col-span-2">
        <input type="checkbox" name="active" defaultChecked={f.active ? f.active === "on" : cause?.active ?? true} />
        In use (a retired cause stays in old versions and cases, but trees can no longer publish with it)
      </label>

      <fieldset className="flex flex-col gap-2 md:col-span-2">
        <legend className="text-sm font-medium text-ink-soft">Parts usually replaced</legend>
        {rows.length === 0 ? <p className="text-sm text-ink-faint">No parts listed.</p> : null}
        {rows.map((row, i) => (
          <div key={i} className="flex flex-wrap items-center gap-2">
            <label className="sr-only" htmlFor={`part-${i}`}>Part {i + 1}</label>
            <select id={`part-${i}`} name="partSlug" value={row.slug} onChange={(e) => setRows((r) => r.map((x, j) => (j === i ? { ...x, slug: e.target.value } : x)))}
              className="min-w-0 flex-1 rounded-md border border-ink-faint/50 bg-white px-2 py-1.5 text-sm">
              <option value="">— pick a part —</option>
              {parts.map((p) => <option key={p.slug} value={p.slug}>{p.name} ({p.sku}, {euros(p.unitPriceCents)})</option>)}
            </select>
            <label className="sr-only" htmlFor={`qty-${i}`}>Quantity of part {i + 1}</label>
            <input id={`qty-${i}`} name="partQty" inputMode="numeric" value={row.quantity} onChange={(e) => setRows((r) => r.map((x, j) => (j === i ? { ...x, quantity: e.target.value } : x)))}
              className="w-16 rounded-md border border-ink-faint/50 bg-white px-2 py-1.5 text-sm" />
            <button type="button" className="text-sm text-danger" onClick={() => setRows((r) => r.filter((_, j) => j !== i))}>Remove</button>
          </div>
        ))}
        <div><button type="button" className="rounded border border-ink-faint/60 px-3 py-1 text-sm hover:bg-paper" onClick={() => setRows((r) => [...r, { slug: "", quantity: "1" }])}>Add a part</button></div>
        {errors.parts ? <p className="text-sm text-danger">{errors.parts}</p> : null}
      </fieldset>

      <div className="flex items-center gap-4 md:col-span-2">
        <SubmitButton pendingText="Saving…">{cause ? "Save cause" : "Add to the catalogue"}</SubmitButton>
        <FormMessage state={state} />
      </div>
    </form>
  );
}
