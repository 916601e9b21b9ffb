"use server";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import type { ActionState } from "@/lib/actions/define";
import { runAction } from "@/lib/actions/run";
import { answerStepAction, type AnsweredStep } from "@/lib/triage/answer";
import { finishCaseAction, type FinishedCase } from "@/lib/triage/finish";
import { saveNotesAction } from "@/lib/triage/notes";
import { startCaseAction } from "@/lib/triage/start";
import { undoStepAction, type UndoneStep } from "@/lib/triage/undo";

export async function startCase(_prev: ActionState<{ id: number; reference: string }>, form: FormData): Promise<ActionState<{ id: number; reference: string }>> {
  const result = await runAction(startCaseAction, form);
  if (result.ok) redirect(`/triage/${result.data.id}`);
  return result;
}

export async function answerStep(_prev: ActionState<AnsweredStep>, form: FormData): Promise<ActionState<AnsweredStep>> {
  return runAction(answerStepAction, form);
}

export async function undoStep(_prev: ActionState<UndoneStep>, form: FormData): Promise<ActionState<UndoneStep>> {
  return runAction(undoStepAction, form);
}

export async function saveNotes(_prev: ActionState<{ savedAt: string }>, form: FormData): Promise<ActionState<{ savedAt: string }>> {
  return runAction(saveNotesAction, form);
}

export async function finishCase(_prev: ActionState<FinishedCase>, form: FormData): Promise<ActionState<FinishedCase>> {
  const result = await runAction(finishCaseAction, form);
  if (result.ok) {
    revalidatePath("/cases");
    redirect(`/cases/${result.data.id}?finished=1`);
  }
  return result;
}
