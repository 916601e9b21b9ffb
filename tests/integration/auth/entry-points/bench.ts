import type { z } from "zod";
import type { ActionSpec } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import { recordFindingAction } from "@/lib/bench/actions";
import { deleteAssemblyAction, saveAssemblyAction, saveLocationAction } from "@/lib/catalogue/assembly-actions";
import type { EntryPointRows } from "../entry-points";

type AnySpec = ActionSpec<z.ZodType, unknown>;
// Technicians and senior mechanics (and administrators) record bench findings; trainees and shop leads do not.
const WORKERS: readonly Role[] = ["admin", "senior", "tech"];
// Senior mechanics (and administrators) describe how each family's unit comes apart.
const EDITORS: readonly Role[] = ["admin", "senior"];
// An allowed caller gets past validation to a 404 on a case that does not exist.
const NO_CASE = "999999";
const STAGES = "app/(shop)/catalogue/families/[slug]/actions.ts";
let counter = 0;

export const rows: EntryPointRows = {
  actions: [
    {
      file: "app/(shop)/cases/[id]/bench/actions.ts", exportName: "recordFinding", spec: recordFindingAction as AnySpec, allowed: WORKERS,
      sample: () => ({ caseId: NO_CASE, cause: "owc-cage-broken", result: "not_found" }),
    },
    {
      file: STAGES, exportName: "saveAssembly", spec: saveAssemblyAction as AnySpec, allowed: EDITORS,
      sample: () => ({
        family: "orvanta-tessel-2", slug: `matrix-stage-${Date.now().toString(36)}-${(counter++).toString(36)}`, name: "Sample stage",
        parent: "unit", openMinutes: "5", closeMinutes: "5", caution: "none",
      }),
    },
    {
      file: STAGES, exportName: "deleteAssembly", spec: deleteAssemblyAction as AnySpec, allowed: EDITORS,
      sample: () => ({ family: "orvanta-tessel-2", slug: "no-such-stage" }),
    },
    {
      file: STAGES, exportName: "saveLocation", spec: saveLocationAction as AnySpec, allowed: EDITORS,
      sample: () => ({ family: "orvanta-tessel-2", cause: "owc-cage-broken", stage: "clutch-pack", inspectMinutes: "10" }),
    },
  ],
  routes: [],
};
