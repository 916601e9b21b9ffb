"use server";
import { revalidatePath } from "next/cache";
import { runAction } from "@/lib/actions/run";
import { setThemeAction } from "@/lib/users/theme";

/** The header's theme switch: a plain form post, so it works before the page's scripts have loaded. */
export async function setTheme(form: FormData): Promise<void> {
  const result = await runAction(setThemeAction, form);
  if (result.ok) revalidatePath("/", "layout");
}
