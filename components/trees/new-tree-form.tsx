"use client";
import { useActionState } from "react";
import { createTree } from "@/app/(shop)/trees/actions";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { ScopeField } from "./scope-field";

export function NewTreeForm({ families }: { families: { slug: string; label: string }[] }) {
  const [state, action] = useActionState(createTree, null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  const fields = state && !state.ok ? state.fields ?? {} : {};
  return (
    <form action={action} noValidate className="flex flex-col gap-3" aria-label="Start a tree">
      <Field label="Reported symptom" name="symptom" defaultValue={fields.symptom} error={errors.symptom} hint="In the caller's words, e.g. “squeaks when braking”." />
      <Field label="Title" name="title" defaultValue={fields.title} error={errors.title} />
      <Field label="Slug" name="slug" defaultValue={fields.slug} error={errors.slug} hint="Lower-case words joined by hyphens; it names the tree in exports." />
      <Field label="Description" name="description" defaultValue={fields.description} error={errors.description} />
      <ScopeField families={families} selected={[]} error={errors.scope} />
      <div className="flex items-center gap-4">
        <SubmitButton pendingText="Creating…">Create and open the editor</SubmitButton>
        <FormMessage state={state} />
      </div>
    </form>
  );
}
