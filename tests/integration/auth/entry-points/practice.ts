import type { z } from "zod";
import type { ActionSpec } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import { commitPracticeAction } from "@/lib/practice/actions";
import type { EntryPointRows } from "../entry-points";

type AnySpec = ActionSpec<z.ZodType, unknown>;
// trainees run practice cases; every other role may too (it never touches real cases).
const ALL: readonly Role[] = ["admin", "lead", "senior", "tech", "trainee"];

export const rows: EntryPointRows = {
  actions: [
    {
      file: "app/(shop)/practice/actions.ts", exportName: "commitPractice", spec: commitPracticeAction as AnySpec, allowed: ALL,
      sample: () => ({ caseId: "999999", cause: "owc-cage-broken", revealedSteps: "0" }),
    },
  ],
  routes: [],
};
