"use server";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import type { ActionResult, ActionState } from "@/lib/actions/define";
import { runAction } from "@/lib/actions/run";
import {
  createTreeAction, discardDraftAction, publishDraftAction, saveDraftAction, startDraftAction, updateTreeDetailsAction,
  type SaveDraftResult,
} from "@/lib/trees/actions";
import type { DraftGraph } from "@/lib/trees/draft";
import { importTreeAction } from "@/lib/trees/import";

type TreeRef = { treeId: number; versionId: number };

export async function createTree(_prev: ActionState<TreeRef>, form: FormData): Promise<ActionState<TreeRef>> {
  const result = await runAction(createTreeAction, form);
  if (!result.ok) return result;
  revalidatePath("/trees");
  redirect(`/trees/${result.data.treeId}/edit`);
}

export async function importTree(_prev: ActionState<TreeRef>, form: FormData): Promise<ActionState<TreeRef>> {
  const result = await runAction(importTreeAction, form);
  if (!result.ok) return result;
  revalidatePath("/trees");
  redirect(`/trees/${result.data.treeId}/edit`);
}

export async function updateTreeDetails(_prev: ActionState<{ treeId: number }>, form: FormData): Promise<ActionState<{ treeId: number }>> {
  const result = await runAction(updateTreeDetailsAction, form);
  if (result.ok) revalidatePath(`/trees/${result.data.treeId}`, "layout");
  return result;
}

/** Called by the editor with the whole draft graph as a plain object. */
export async function saveDraft(input: { versionId: number; revision: number; graph: DraftGraph }): Promise<ActionResult<SaveDraftResult>> {
  return runAction(saveDraftAction, input);
}

export async function publishDraft(input: { versionId: number; revision: number; note?: string }): Promise<ActionResult<{ treeId: number; versionId: number; number: number }>> {
  const result = await runAction(publishDraftAction, input);
  if (result.ok) revalidatePath(`/trees/${result.data.treeId}`, "layout");
  return result;
}

export async function startDraft(_prev: ActionState<TreeRef>, form: FormData): Promise<ActionState<TreeRef>> {
  const result = await runAction(startDraftAction, form);
  if (!result.ok) return result;
  revalidatePath(`/trees/${result.data.treeId}`, "layout");
  redirect(`/trees/${result.data.treeId}/edit`);
}

export async function discardDraft(_prev: ActionState<{ treeId: number }>, form: FormData): Promise<ActionState<{ treeId: number }>> {
  const result = await runAction(discardDraftAction, form);
  if (!result.ok) return result;
  revalidatePath("/trees", "layout");
  redirect(result.data.treeRemoved ? "/trees" : `/trees/${result.data.treeId}`);
}
