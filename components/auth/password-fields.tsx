import { Field } from "@/components/ui/field";

/** New password and its repetition, with the policy said up front. */
export function NewPasswordFields({ errors, label = "New password" }: { errors: Record<string, string>; label?: string }) {
  return (
    <>
      <Field label={label} name="password" type="password" autoComplete="new-password" minLength={12} maxLength={200}
        hint="At least 12 characters; not your e-mail address and not a commonly used password. A few unrelated words work well."
        error={errors.password} />
      <Field label="Repeat it" name="confirm" type="password" autoComplete="new-password" error={errors.confirm} />
    </>
  );
}
