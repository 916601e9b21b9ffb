"use server";
import { revalidatePath } from "next/cache";
import type { ActionState } from "@/lib/actions/define";
import { runAction } from "@/lib/actions/run";
import { retryMailAction } from "@/lib/mail/actions";

export async function retryMail(_prev: ActionState<{ id: number }>, form: FormData): Promise<ActionState<{ id: number }>> {
  const result = await runAction(retryMailAction, form);
  if (result.ok) revalidatePath("/outbox", "layout");
  return result;
}
