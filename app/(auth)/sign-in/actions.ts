"use server";
import { cookies, headers } from "next/headers";
import { redirect } from "next/navigation";
import type { ActionState } from "@/lib/actions/define";
import { executeAction } from "@/lib/actions/define";
import { signOutCurrent } from "@/lib/auth/session";
import { signInAction, type SignInResult } from "@/lib/auth/sign-in";

export async function signIn(_prev: ActionState<SignInResult>, form: FormData): Promise<ActionState<SignInResult>> {
  const ip = (await headers()).get("x-forwarded-for")?.split(",")[0]?.trim();
  if (ip) form.set("ip", ip);
  const result = await executeAction(signInAction, form, null);
  if (!result.ok) return result;
  const { cookie, next } = result.data;
  (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
  redirect(next);
}

export async function signOut(): Promise<void> {
  await signOutCurrent();
  redirect("/sign-in");
}
