"use server";
import { revalidatePath } from "next/cache";
import type { ActionState } from "@/lib/actions/define";
import { runAction } from "@/lib/actions/run";
import { saveWarrantyAction } from "@/lib/survival/actions";

export async function saveWarranty(_prev: ActionState<{ months: number }>, form: FormData): Promise<ActionState<{ months: number }>> {
  const result = await runAction(saveWarrantyAction, form);
  if (result.ok) {
    revalidatePath("/reports/lasting");
    revalidatePath("/cases");
  }
  return result;
}
