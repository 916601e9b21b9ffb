"use server";
import { revalidatePath } from "next/cache";
import type { ActionState } from "@/lib/actions/define";
import { runAction } from "@/lib/actions/run";
import { commitPracticeAction } from "@/lib/practice/actions";
import type { BenchResult } from "@/lib/practice/types";

type Result = ActionState<BenchResult>;

export async function commitPractice(_prev: Result, form: FormData): Promise<Result> {
  const result = await runAction(commitPracticeAction, form);
  if (result.ok) {
    revalidatePath("/practice");
    revalidatePath("/");
  }
  return result;
}
