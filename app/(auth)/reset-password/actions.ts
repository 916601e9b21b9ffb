"use server";
import { redirect } from "next/navigation";
import type { ActionState } from "@/lib/actions/define";
import { executeAction } from "@/lib/actions/define";
import { requestResetAction, setPasswordFromLinkAction } from "@/lib/users/password";

export async function requestReset(_prev: ActionState<{ sent: boolean }>, form: FormData): Promise<ActionState<{ sent: boolean }>> {
  return executeAction(requestResetAction, form, null);
}

/** Used by both the invitation and the reset page: the link's purpose travels with the form. */
export async function setPasswordFromLink(_prev: ActionState<{ email: string }>, form: FormData): Promise<ActionState<{ email: string }>> {
  const result = await executeAction(setPasswordFromLinkAction, form, null);
  if (!result.ok) return result;
  redirect("/sign-in?password=set");
}
