"use client";
import { useActionState } from "react";
import { setPasswordFromLink } from "@/app/(auth)/reset-password/actions";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { NewPasswordFields } from "./password-fields";

export function SetPasswordForm({ token, purpose, email }: { token: string; purpose: "invite" | "reset"; email: string }) {
  const [state, action] = useActionState(setPasswordFromLink, null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  return (
    <form action={action} noValidate className="flex flex-col gap-4">
      <input type="hidden" name="token" value={token} />
      <input type="hidden" name="purpose" value={purpose} />
      {/* Lets a password manager store the new password under the right account. */}
      <input type="email" name="username" value={email} autoComplete="username" readOnly hidden />
      <NewPasswordFields errors={errors} label="Choose a password" />
      <FormMessage state={state} />
      <SubmitButton pendingText="Saving…">Set my password</SubmitButton>
    </form>
  );
}
