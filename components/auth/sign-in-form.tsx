"use client";
import { useActionState } from "react";
import { signIn } from "@/app/(auth)/sign-in/actions";
import { Field } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";

export function SignInForm({ next }: { next?: string }) {
  const [state, action] = useActionState(signIn, null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  const fields = state && !state.ok ? state.fields ?? {} : {};
  return (
    <form action={action} noValidate className="flex flex-col gap-4">
      {next ? <input type="hidden" name="next" value={next} /> : null}
      <Field label="E-mail address" name="email" type="email" autoComplete="username" defaultValue={fields.email} error={errors.email} key={`e${fields.email ?? ""}`} />
      <Field label="Password" name="password" type="password" autoComplete="current-password" error={errors.password} />
      <p aria-live="polite" role="status" className="min-h-5 text-sm text-danger" data-testid="sign-in-message">
        {state && !state.ok && !errors.email ? state.error : ""}
      </p>
      <SubmitButton pendingText="Signing in…">Sign in</SubmitButton>
    </form>
  );
}
