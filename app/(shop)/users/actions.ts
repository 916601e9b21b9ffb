"use server";
import { revalidatePath } from "next/cache";
import type { ActionState } from "@/lib/actions/define";
import { runAction } from "@/lib/actions/run";
import { addUserAction, changeRoleAction, setActiveAction } from "@/lib/users/actions";

type Result = ActionState<{ id: string }>;

export async function addUser(_prev: Result, form: FormData): Promise<Result> {
  const result = await runAction(addUserAction, form);
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
