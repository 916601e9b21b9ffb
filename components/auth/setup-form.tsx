"use client";
import { useActionState } from "react";
import { setUpShop } from "@/app/(auth)/setup/actions";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { NewPasswordFields } from "./password-fields";

export function SetupForm() {
  const [state, action] = useActionState(setUpShop, null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  const fields = state && !state.ok ? state.fields ?? {} : {};
  return (
    <form action={action} noValidate className="flex flex-col gap-4">
      <Field label="Your name" name="name" autoComplete="name" defaultValue={fields.name} error={errors.name} key={`n${fields.name ?? ""}`} />
      <Field label="Your e-mail address" name="email" type="email" autoComplete="username" defaultValue={fields.email} error={errors.email} key={`e${fields.email ?? ""}`} />
      <NewPasswordFields errors={errors} label="Password" />
      <Field label="Workshop name" name="shopName" autoComplete="organization" defaultValue={fields.shopName} error={errors.shopName} key={`s${fields.shopName ?? ""}`} />
      <Field label="Workshop e-mail address" name="shopEmail" type="email" hint="Mail to customers is sent in the workshop's name from this address."
        defaultValue={fields.shopEmail} error={errors.shopEmail} key={`m${fields.shopEmail ?? ""}`} />
      <FormMessage state={state} />
      <SubmitButton pendingText="Setting up…">Create the administrator account</SubmitButton>
    </form>
  );
}
