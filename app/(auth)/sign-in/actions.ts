"use server";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import type { ActionState } from "@/lib/actions/define";
import { executeAction } from "@/lib/actions/define";
import { currentToken, setSessionCookie, signOutCurrent } from "@/lib/auth/session";
import { signInAction, type SignInResult } from "@/lib/auth/sign-in";
import { clientSource } from "@/lib/http/client-source";

export async function signIn(_prev: ActionState<SignInResult>, form: FormData): Promise<ActionState<SignInResult>> {
  form.set("source", clientSource(await headers()) ?? "");
  form.set("previousToken", (await currentToken()) ?? "");
  const result = await executeAction(signInAction, form, null);
  if (!result.ok) return result;
  const { cookie, next } = result.data;
  await setSessionCookie(cookie);
  redirect(next);
}

export async function signOut(): Promise<void> {
  await signOutCurrent();
  redirect("/sign-in");
}
