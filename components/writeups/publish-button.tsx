"use client";
import { useActionState } from "react";
import { publishWriteup } from "@/app/(shop)/writeups/actions";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";

export function PublishButton({ id }: { id: number }) {
  const [state, action] = useActionState(publishWriteup, null);
  return (
    <form action={action} className="flex flex-col gap-1">
      <input type="hidden" name="id" value={id} />
      <SubmitButton pendingText="Publishing…">Publish</SubmitButton>
      <FormMessage state={state} />
    </form>
  );
}
