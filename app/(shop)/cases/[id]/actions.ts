"use server";
import { revalidatePath } from "next/cache";
import type { ActionState } from "@/lib/actions/define";
import { runAction } from "@/lib/actions/run";
import { reopenCaseAction, saveOutcomeAction, startBenchAction, type OutcomeSaved } from "@/lib/outcomes/actions";

type Moved = ActionState<{ caseId: number }>;

function refresh(caseId: number) {
  revalidatePath(`/cases/${caseId}`);
  revalidatePath("/cases");
}

export async function saveOutcome(_prev: ActionState<OutcomeSaved>, form: FormData): Promise<ActionState<OutcomeSaved>> {
  const result = await runAction(saveOutcomeAction, form);
  if (result.ok) refresh(result.data.caseId);
  return result;
}

export async function startBench(_prev: Moved, form: FormData): Promise<Moved> {
  const result = await runAction(startBenchAction, form);
  if (result.ok) refresh(result.data.caseId);
  return result;
}

export async function reopenCase(_prev: Moved, form: FormData): Promise<Moved> {
  const result = await runAction(reopenCaseAction, form);
  if (result.ok) refresh(result.data.caseId);
  return result;
}
