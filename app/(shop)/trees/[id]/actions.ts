"use server";
import { revalidatePath } from "next/cache";
import type { ActionState } from "@/lib/actions/define";
import { runAction } from "@/lib/actions/run";
import { acceptSuggestionAction, setLikelihoodModeAction, type AcceptedSuggestion } from "@/lib/review/actions";

export async function acceptSuggestion(_prev: ActionState<AcceptedSuggestion>, form: FormData): Promise<ActionState<AcceptedSuggestion>> {
  const result = await runAction(acceptSuggestionAction, form);
  if (result.ok) {
    revalidatePath(`/trees/${result.data.treeId}`, "layout");
    revalidatePath("/");
  }
  return result;
}

type ModeSet = ActionState<{ treeId: number; mode: string }>;

export async function setLikelihoodMode(_prev: ModeSet, form: FormData): Promise<ModeSet> {
  const result = await runAction(setLikelihoodModeAction, form);
  if (result.ok) revalidatePath(`/trees/${result.data.treeId}`, "layout");
  return result;
}
