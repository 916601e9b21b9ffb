import type { z } from "zod";
import type { ActionSpec } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import { answerStepAction } from "@/lib/triage/answer";
import { finishCaseAction } from "@/lib/triage/finish";
import { saveNotesAction } from "@/lib/triage/notes";
import { startCaseAction } from "@/lib/triage/start";
import { undoStepAction } from "@/lib/triage/undo";
import type { EntryPointRows } from "../entry-points";

type AnySpec = ActionSpec<z.ZodType, unknown>;
// DESIGN §2: tech, senior and admin walk cases; the lead reads them; trainees never touch real cases.
const WORKERS: readonly Role[] = ["admin", "senior", "tech"];
const STAFF: readonly Role[] = ["admin", "lead", "senior", "tech"];
const FILE = "app/(shop)/triage/actions.ts";

// The role matrix runs on an empty database, so allowed callers get past the role check and
// validation, then a 404/422 for the missing case or tree; that is enough to tell them from 401/403.
export const rows: EntryPointRows = {
  actions: [
    {
      file: FILE, exportName: "startCase", spec: startCaseAction as AnySpec, allowed: WORKERS,
      sample: () => ({ callerName: "Role Check", callerKind: "rider", phone: "+00 555 0100 0001", email: "", familyId: 1, ridingUse: "road", treeVersionId: 1 }),
    },
    { file: FILE, exportName: "answerStep", spec: answerStepAction as AnySpec, allowed: WORKERS, sample: () => ({ caseId: 1, nodeId: 1, optionId: 1 }) },
    { file: FILE, exportName: "undoStep", spec: undoStepAction as AnySpec, allowed: WORKERS, sample: () => ({ caseId: 1, seq: 1 }) },
    { file: FILE, exportName: "saveNotes", spec: saveNotesAction as AnySpec, allowed: WORKERS, sample: () => ({ caseId: 1, notes: "note" }) },
    {
      file: FILE, exportName: "finishCase", spec: finishCaseAction as AnySpec, allowed: WORKERS,
      sample: () => ({ caseId: 1, outcome: "advised", advice: "Checked the display settings with the caller." }),
    },
  ],
  routes: [
    { file: "app/api/cases/route.ts", method: "GET", path: "/api/cases?status=open&limit=10", allowed: STAFF },
    {
      file: "app/api/cases/[id]/steps/route.ts", method: "POST", path: "/api/cases/1/steps", allowed: WORKERS,
      params: { id: "1" }, body: { nodeId: 1, optionId: 1 },
    },
  ],
};
