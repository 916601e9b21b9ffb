"use server";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import type { ActionState } from "@/lib/actions/define";
import { runAction } from "@/lib/actions/run";
import { publishWriteupAction, saveWriteupAction } from "@/lib/writeups/actions";

type Saved = ActionState<{ id: number; status: "draft" | "published" }>;
type Published = ActionState<{ id: number }>;

export async function saveWriteup(_prev: Saved, form: FormData): Promise<Saved> {
  const result = await runAction(saveWriteupAction, form);
  if (result.ok) {
    revalidatePath("/writeups");
    revalidatePath("/");
    redirect(`/writeups/${result.data.id}?saved=${result.data.status}`);
  }
  return result;
}

export async function publishWriteup(_prev: Published, form: FormData): Promise<Published> {
  const result = await runAction(publishWriteupAction, form);
  if (result.ok) {
    revalidatePath("/writeups");
    revalidatePath(`/writeups/${result.data.id}`);
    revalidatePath("/");
  }
  return result;
}
