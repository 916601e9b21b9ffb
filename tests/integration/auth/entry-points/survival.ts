import type { z } from "zod";
import type { ActionSpec } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import { saveWarrantyAction } from "@/lib/survival/actions";
import type { EntryPointRows } from "../entry-points";

type AnySpec = ActionSpec<z.ZodType, unknown>;
// The warranty period is a shop setting: only the administrator changes settings.
const ADMIN: readonly Role[] = ["admin"];

export const rows: EntryPointRows = {
  actions: [
    { file: "app/(shop)/reports/lasting/actions.ts", exportName: "saveWarranty", spec: saveWarrantyAction as AnySpec, allowed: ADMIN, sample: () => ({ months: "6" }) },
  ],
  routes: [],
};
