"use client";
import { useActionState, useDeferredValue, useMemo, useRef, useState } from "react";
import { saveWriteup } from "@/app/(shop)/writeups/actions";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { renderMarkdown } from "@/lib/markdown/render";
import type { WriteupFormOptions } from "@/lib/writeups/queries";
import { CheckboxPicker } from "./checkbox-picker";
import { MarkdownBody } from "./markdown-body";
import { PhotoUploadButton } from "./photo-upload-button";

export interface EditorValues {
  id?: number;
  updatedAt?: string;
  status: "draft" | "published";
  title: string;
  summary: string;
  body: string;
  familyIds: number[];
  causeIds: number[];
  partIds: number[];
  tags: string;
  caseReference: string;
}

const inputClass = (error?: string) =>
  `w-full rounded-md border bg-white px-3 py-2 text-ink shadow-inner ${error ? "border-danger" : "border-ink-faint/50"}`;

function ErrorText({ id, error }: { id: string; error?: string }) {
  return error ? <p id={id} className="text-sm text-danger">{error}</p> : null;
}

export function WriteupEditor({ initial, options, canPublish }: { initial: EditorValues; options: WriteupFormOptions; canPublish: boolean }) {
  const [state, action] = useActionState(saveWriteup, null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  const [values, setValues] = useState(initial);
  const set = <K extends keyof EditorValues>(key: K, value: EditorValues[K]) => setValues((v) => ({ ...v, [key]: value }));
  const bodyRef = useRef<HTMLTextAreaElement>(null);
  const deferredBody = useDeferredValue(values.body);
  const preview = useMemo(() => renderMarkdown(deferredBody), [deferredBody]);

  function insertAtCursor(markdown: string) {
    const area = bodyRef.current;
    const at = area ? area.selectionEnd : values.body.length;
    const before = values.body.slice(0, at).replace(/\s*$/, "");
    const after = values.body.slice(at).replace(/^\s*/, "");
    const next = `${before}${before ? "\n\n" : ""}${markdown}\n\n${after}`;
    set("body", next);
    requestAnimationFrame(() => {
      const caret = before.length + (before ? 2 : 0) + markdown.length + 2;
      area?.focus();
      area?.setSelectionRange(caret, caret);
    });
  }

  const field = (key: "title" | "summary" | "caseReference" | "tags") => ({
    id: `writeup-${key}`,
    name: key,
    value: values[key],
    onChange: (e: React.ChangeEvent<HTMLInputElement | HTMLTextAreaElement>) => set(key, e.target.value),
    "aria-invalid": errors[key] ? true : undefined,
    "aria-describedby": errors[key] ? `writeup-${key}-error` : undefined,
    className: inputClass(errors[key]),
  });

  return (
    <form action={action} noValidate className="flex flex-col gap-6" data-testid="writeup-editor">
      {values.id ? <input type="hidden" name="id" value={values.id} /> : null}
      {values.updatedAt ? <input type="hidden" name="expectedUpdatedAt" value={values.updatedAt} /> : null}
      <div className="grid gap-6 lg:grid-cols-2">
        <div className="flex min-w-0 flex-col gap-4">
          <div className="flex flex-col gap-1">
            <label htmlFor="writeup-title" className="text-sm font-medium text-ink-soft">Title</label>
            <input {...field("title")} maxLength={160} />
            <ErrorText id="writeup-title-error" error={errors.title} />
          </div>
          <div className="flex flex-col gap-1">
            <label htmlFor="writeup-summary" className="text-sm font-medium text-ink-soft">Summary</label>
            <textarea {...field("summary")} rows={2} maxLength={400} />
            <ErrorText id="writeup-summary-error" error={errors.summary} />
          </div>
          <div className="flex flex-col gap-1">
            <div className="flex flex-wrap items-end justify-between gap-2">
              <label htmlFor="writeup-body" className="text-sm font-medium text-ink-soft">Body (Markdown)</label>
              <PhotoUploadButton writeupId={values.id} onUploaded={insertAtCursor} />
            </div>
            <textarea
              ref={bodyRef}
              id="writeup-body"
              name="body"
              value={values.body}
              onChange={(e) => set("body", e.target.value)}
              rows={22}
              spellCheck
              aria-invalid={errors.body ? true : undefined}
              aria-describedby={errors.body ? "writeup-body-error" : "writeup-body-hint"}
              className={`${inputClass(errors.body)} font-mono text-sm leading-6`}
            />
            <p id="writeup-body-hint" className="text-xs text-ink-faint">
              ## for a section, - for a list, | for a table, ``` for code. Photos go in with “Add photo”.
            </p>
            <ErrorText id="writeup-body-error" error={errors.body} />
          </div>
        </div>
        <section aria-label="Preview" className="min-w-0 rounded-lg border border-ink-faint/30 bg-white p-5 lg:sticky lg:top-4 lg:max-h-[calc(100vh-2rem)] lg:self-start lg:overflow-y-auto">
          <p className="mb-3 text-xs uppercase tracking-wide text-ink-faint">Preview</p>
          <h1 className="text-2xl">{values.title || "Untitled write-up"}</h1>
          {values.summary ? <p className="mt-1 text-ink-soft">{values.summary}</p> : null}
          <div className="mt-4">
            {values.body.trim() ? null : <p className="text-sm text-ink-faint">The body appears here as you type, exactly as the published page will show it.</p>}
            <MarkdownBody html={preview.html} testId="writeup-preview" />
          </div>
        </section>
      </div>

      <div className="grid gap-6 md:grid-cols-3">
        <CheckboxPicker
          name="familyIds" label="Motor families" selected={values.familyIds} onChange={(v) => set("familyIds", v)} error={errors.familyIds}
          options={options.families.map((f) => ({ value: f.id, label: f.name, hint: f.maker }))}
        />
        <CheckboxPicker
          name="causeIds" label="Causes" selected={values.causeIds} onChange={(v) => set("causeIds", v)} error={errors.causeIds}
          options={options.causes.map((c) => ({ value: c.id, label: c.name, hint: c.area.replace("_", " ") }))}
        />
        <CheckboxPicker
          name="partIds" label="Parts" selected={values.partIds} onChange={(v) => set("partIds", v)} error={errors.partIds}
          options={options.parts.map((p) => ({ value: p.id, label: p.name, hint: p.sku }))}
        />
      </div>

      <div className="grid gap-6 md:grid-cols-2">
        <div className="flex flex-col gap-1">
          <label htmlFor="writeup-tags" className="text-sm font-medium text-ink-soft">Tags, separated by commas</label>
          <input {...field("tags")} list="writeup-tag-list" />
          <datalist id="writeup-tag-list">{options.tags.map((t) => <option key={t} value={t} />)}</datalist>
          <ErrorText id="writeup-tags-error" error={errors.tags} />
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor="writeup-caseReference" className="text-sm font-medium text-ink-soft">Linked case reference (optional)</label>
          <input {...field("caseReference")} placeholder="the case this came from" />
          <ErrorText id="writeup-caseReference-error" error={errors.caseReference} />
        </div>
      </div>

      <div className="flex flex-wrap items-center gap-3 border-t border-ink-faint/20 pt-4">
        <SubmitButton name="intent" value="draft" pendingText="Saving…" className={canPublish ? "bg-ink hover:bg-ink-soft" : ""}>
          {values.status === "published" && canPublish ? "Save as draft (unpublish)" : "Save draft"}
        </SubmitButton>
        {canPublish ? (
          <SubmitButton name="intent" value="publish" pendingText="Publishing…">
            {values.status === "published" ? "Save and keep published" : "Publish"}
          </SubmitButton>
        ) : (
          <p className="text-sm text-ink-faint">A senior mechanic reviews and publishes drafts.</p>
        )}
        <FormMessage state={state} />
      </div>
    </form>
  );
}
