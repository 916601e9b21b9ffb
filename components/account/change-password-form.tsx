"use client";
import { useActionState } from "react";
import { changePassword } from "@/app/(shop)/account/actions";
import { NewPasswordFields } from "@/components/auth/password-fields";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";

export function ChangePasswordForm({ email }: { email: string }) {
  const [state, action] = useActionState(changePassword, null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  return (
    <form action={action} noValidate className="flex max-w-md flex-col gap-4" key={state?.ok ? "done" : "editing"}>
      <input type="email" name="username" value={email} autoComplete="username" readOnly hidden />
      <Field label="Current password" name="current" type="password" autoComplete="current-password" error={errors.current} />
      <NewPasswordFields errors={errors} />
      <div className="flex items-center gap-4">
        <SubmitButton pendingText="Changing…">Change password</SubmitButton>
        <FormMessage state={state} />
      </div>
    </form>
  );
}
