"use client";
import { useActionState } from "react";
import { requestReset } from "@/app/(auth)/reset-password/actions";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";

export function ResetRequestForm() {
  const [state, action] = useActionState(requestReset, null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  return (
    <form action={action} noValidate className="flex flex-col gap-4">
      <Field label="E-mail address" name="email" type="email" autoComplete="username" error={errors.email} />
      <FormMessage state={state} />
      <SubmitButton pendingText="Sending…">Send me a link</SubmitButton>
    </form>
  );
}
