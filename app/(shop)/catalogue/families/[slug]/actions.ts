"use server";
import { revalidatePath } from "next/cache";
import type { ActionState } from "@/lib/actions/define";
import { runAction } from "@/lib/actions/run";
import { deleteAssemblyAction, saveAssemblyAction, saveLocationAction } from "@/lib/catalogue/assembly-actions";

type Saved = ActionState<{ family: string }>;

export async function saveAssembly(_prev: Saved, form: FormData): Promise<Saved> {
  const result = await runAction(saveAssemblyAction, form);
  if (result.ok) revalidatePath(`/catalogue/families/${result.data.family}`);
  return result;
}

export async function deleteAssembly(_prev: Saved, form: FormData): Promise<Saved> {
  const result = await runAction(deleteAssemblyAction, form);
  if (result.ok) revalidatePath(`/catalogue/families/${result.data.family}`);
  return result;
}

export async function saveLocation(_prev: Saved, form: FormData): Promise<Saved> {
  const result = await runAction(saveLocationAction, form);
  if (result.ok) revalidatePath(`/catalogue/families/${result.data.family}`);
  return result;
}
