"use server";
import { revalidatePath } from "next/cache";
import type { ActionState } from "@/lib/actions/define";
import { runAction } from "@/lib/actions/run";
import { recordFindingAction } from "@/lib/bench/actions";
import type { FindingResult } from "@/db/schema";

export type FindingSaved = ActionState<{ caseId: number; cause: string; result: FindingResult }>;

export async function recordFinding(_prev: FindingSaved, form: FormData): Promise<FindingSaved> {
  const result = await runAction(recordFindingAction, form);
  if (result.ok) revalidatePath(`/cases/${result.data.caseId}/bench`);
  return result;
}
