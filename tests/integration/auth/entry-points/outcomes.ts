import type { z } from "zod";
import type { ActionSpec } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import { reopenCaseAction, saveOutcomeAction, startBenchAction } from "@/lib/outcomes/actions";
import type { EntryPointRows } from "../entry-points";

type AnySpec = ActionSpec<z.ZodType, unknown>;
const FILE = "app/(shop)/cases/[id]/actions.ts";
// DESIGN §2: tech, senior (and admin) record bench outcomes; reopening a closed case is for senior and admin.
const WORKERS: readonly Role[] = ["admin", "senior", "tech"];
const EDITORS: readonly Role[] = ["admin", "senior"];
// The role matrix runs on an empty database: an allowed caller gets past validation to a 404.
const NO_CASE = "999999";

export const rows: EntryPointRows = {
  actions: [
    { file: FILE, exportName: "saveOutcome", spec: saveOutcomeAction as AnySpec, allowed: WORKERS, sample: () => ({ caseId: NO_CASE, labourMinutes: "30" }) },
    { file: FILE, exportName: "startBench", spec: startBenchAction as AnySpec, allowed: WORKERS, sample: () => ({ caseId: NO_CASE }) },
    { file: FILE, exportName: "reopenCase", spec: reopenCaseAction as AnySpec, allowed: EDITORS, sample: () => ({ caseId: NO_CASE, reason: "Wrong cause recorded" }) },
  ],
  routes: [],
};
