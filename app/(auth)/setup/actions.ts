"use server";
import { redirect } from "next/navigation";
import type { ActionState } from "@/lib/actions/define";
import { executeAction } from "@/lib/actions/define";
import { setSessionCookie } from "@/lib/auth/session";
import { setupAction } from "@/lib/users/setup";

type Result = ActionState<{ id: string }>;

export async function setUpShop(_prev: Result, form: FormData): Promise<Result> {
  const result = await executeAction(setupAction, form, null);
  if (!result.ok) return result;
  await setSessionCookie(result.data.cookie);
  redirect("/users?welcome=1");
}
