"use client";
import { useActionState } from "react";
import { updateTreeDetails } from "@/app/(shop)/trees/actions";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { ScopeField } from "./scope-field";

export function TreeDetailsForm({ tree, families }: {
  tree: { id: number; symptom: string; title: string; description: string; scope: string[] };
  families: { slug: string; label: string }[];
}) {
  const [state, action] = useActionState(updateTreeDetails, null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  return (
    <form action={action} noValidate className="flex flex-col gap-3">
      <input type="hidden" name="treeId" value={tree.id} />
      <Field label="Reported symptom" name="symptom" defaultValue={tree.symptom} error={errors.symptom} />
      <Field label="Title" name="title" defaultValue={tree.title} error={errors.title} />
      <Field label="Description" name="description" defaultValue={tree.description} error={errors.description} />
      <ScopeField families={families} selected={tree.scope} error={errors.scope} />
      <p className="text-xs text-ink-faint">These details belong to the tree, not to a version: a change shows on every version at once.</p>
      <div className="flex items-center gap-4">
        <SubmitButton pendingText="Saving…">Save details</SubmitButton>
        <FormMessage state={state} />
      </div>
    </form>
  );
}
