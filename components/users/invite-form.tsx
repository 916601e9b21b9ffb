"use client";
import { useActionState } from "react";
import { inviteUser } from "@/app/(shop)/users/actions";
import { Field, SelectField } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { roleOptions } from "./role-options";

export function InviteForm({ canGrantAdmin }: { canGrantAdmin: boolean }) {
  const [state, action] = useActionState(inviteUser, null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  const fields = state && !state.ok ? state.fields ?? {} : {};
  return (
    <form action={action} noValidate className="grid gap-4 md:grid-cols-3" key={state?.ok ? `done${state.data.id}` : "editing"}>
      <Field label="Name" name="name" defaultValue={fields.name} error={errors.name} />
      <Field label="E-mail address" name="email" type="email" defaultValue={fields.email} error={errors.email} />
      <SelectField label="Role" name="role" defaultValue={fields.role ?? "tech"} options={roleOptions(canGrantAdmin)} error={errors.role} />
      <div className="flex flex-wrap items-center gap-4 md:col-span-3">
        <SubmitButton pendingText="Sending…">Send invitation</SubmitButton>
        <FormMessage state={state} />
      </div>
      <p className="text-xs text-ink-faint md:col-span-3">
        The person gets an e-mail with a link to choose their own password; it works once, for 72 hours. Inviting the same address again replaces the link.
      </p>
    </form>
  );
}
