"use server";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import type { ActionState } from "@/lib/actions/define";
import { runAction } from "@/lib/actions/run";
import { saveCauseAction } from "@/lib/catalogue/actions";

export async function saveCause(_prev: ActionState<{ slug: string }>, form: FormData): Promise<ActionState<{ slug: string }>> {
  const result = await runAction(saveCauseAction, form);
  if (!result.ok) return result;
  revalidatePath("/catalogue");
  redirect(`/catalogue?saved=${encodeURIComponent(result.data.slug)}#cause-${result.data.slug}`);
}
