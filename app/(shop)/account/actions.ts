"use server";
import { redirect } from "next/navigation";
import type { ActionState } from "@/lib/actions/define";
import { runAction } from "@/lib/actions/run";
import { clearSessionCookie, setSessionCookie } from "@/lib/auth/session";
import { changePasswordAction, signOutEverywhereAction } from "@/lib/users/password";

export async function changePassword(_prev: ActionState<{ done: boolean }>, form: FormData): Promise<ActionState<{ done: boolean }>> {
  const result = await runAction(changePasswordAction, form);
  if (!result.ok) return result;
  await setSessionCookie(result.data.cookie);
  return { ok: true, data: { done: true }, message: result.message };
}

export async function signOutEverywhere(): Promise<void> {
  const result = await runAction(signOutEverywhereAction, {});
  if (result.ok) await clearSessionCookie();
  redirect("/sign-in");
}
