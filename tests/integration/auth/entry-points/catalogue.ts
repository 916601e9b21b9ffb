import type { z } from "zod";
import type { ActionSpec } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import { saveCauseAction } from "@/lib/catalogue/actions";
import type { EntryPointRows } from "../entry-points";

type AnySpec = ActionSpec<z.ZodType, unknown>;
// senior mechanics manage the cause and part catalogue; administrators may do everything.
const EDITORS: readonly Role[] = ["admin", "senior"];
let counter = 0;

export const rows: EntryPointRows = {
  actions: [
    {
      file: "app/(shop)/catalogue/actions.ts", exportName: "saveCause", spec: saveCauseAction as AnySpec, allowed: EDITORS,
      sample: () => ({
        slug: `matrix-cause-${Date.now().toString(36)}-${(counter++).toString(36)}`, name: "Sample cause", area: "other", description: "",
        inspectMinutes: "15", labourMinutes: "30", priceLow: "10", priceHigh: "20", ratingNm: "",
      }),
    },
  ],
  routes: [],
};
