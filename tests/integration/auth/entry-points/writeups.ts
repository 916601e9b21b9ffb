import type { z } from "zod";
import type { ActionSpec } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import { publishWriteupAction, saveWriteupAction } from "@/lib/writeups/actions";
import type { EntryPointRows } from "../entry-points";

type AnySpec = ActionSpec<z.ZodType, unknown>;
const ALL: readonly Role[] = ["admin", "lead", "senior", "tech", "trainee"];
// tech drafts write-ups; senior publishes; admin may do everything.
const DRAFTERS: readonly Role[] = ["admin", "senior", "tech"];
const PUBLISHERS: readonly Role[] = ["admin", "senior"];

export const rows: EntryPointRows = {
  actions: [
    {
      file: "app/(shop)/writeups/actions.ts", exportName: "saveWriteup", spec: saveWriteupAction as AnySpec, allowed: DRAFTERS,
      sample: () => ({
        title: "Role matrix draft", summary: "A draft saved by the role matrix test.",
        body: "Reported, found and fixed: enough words for a body.", intent: "draft",
      }),
    },
    {
      file: "app/(shop)/writeups/actions.ts", exportName: "publishWriteup", spec: publishWriteupAction as AnySpec, allowed: PUBLISHERS,
      sample: () => ({ id: "999999" }),
    },
  ],
  routes: [{ file: "app/api/writeups/index/route.ts", method: "GET", path: "/api/writeups/index", allowed: ALL }],
};
