"use client";
import { useActionState } from "react";
import { addUser } from "@/app/(shop)/users/actions";
import { Field, SelectField } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { roleOptions } from "./role-options";

export function AddUserForm({ canGrantAdmin }: { canGrantAdmin: boolean }) {
  const [state, action] = useActionState(addUser, null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  const fields = state && !state.ok ? state.fields ?? {} : {};
  return (
    <form action={action} noValidate className="grid gap-4 md:grid-cols-2" key={state?.ok ? "done" : "editing"}>
      <Field label="Name" name="name" defaultValue={fields.name} error={errors.name} />
      <Field label="E-mail address" name="email" type="email" defaultValue={fields.email} error={errors.email} />
      <SelectField label="Role" name="role" defaultValue={fields.role ?? "tech"} options={roleOptions(canGrantAdmin)} error={errors.role} />
      <Field label="First password" name="password" type="password" autoComplete="new-password" hint="At least 10 characters; ask them to keep it private." error={errors.password} />
      <div className="flex items-center gap-4 md:col-span-2">
        <SubmitButton pendingText="Adding…">Add person</SubmitButton>
        <FormMessage state={state} />
      </div>
    </form>
  );
}
