"use server";
import { revalidatePath } from "next/cache";
import type { ActionState } from "@/lib/actions/define";
import { runAction } from "@/lib/actions/run";
import { changeRoleAction, forceResetAction, setActiveAction } from "@/lib/users/actions";
import { inviteUserAction } from "@/lib/users/invite";

type Result = ActionState<{ id: string }>;

export async function inviteUser(_prev: Result, form: FormData): Promise<Result> {
  const result = await runAction(inviteUserAction, form);
  if (result.ok) revalidatePath("/users");
  return result;
}

export async function changeRole(_prev: Result, form: FormData): Promise<Result> {
  const result = await runAction(changeRoleAction, form);
  if (result.ok) revalidatePath("/users");
  return result;
}

export async function setActive(_prev: Result, form: FormData): Promise<Result> {
  const result = await runAction(setActiveAction, form);
  if (result.ok) revalidatePath("/users");
  return result;
}

export async function forceReset(_prev: Result, form: FormData): Promise<Result> {
  const result = await runAction(forceResetAction, form);
  if (result.ok) revalidatePath("/users");
  return result;
}
