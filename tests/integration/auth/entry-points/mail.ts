import type { z } from "zod";
import type { ActionSpec } from "@/lib/actions/define";
import type { Role } from "@/lib/auth/roles";
import { retryMailAction } from "@/lib/mail/actions";
import type { EntryPointRows } from "../entry-points";

type AnySpec = ActionSpec<z.ZodType, unknown>;
// The outbox is the admin's and the lead's (outbox:read); "retry now" goes with it.
const MAIL_READERS: readonly Role[] = ["admin", "lead"];

export const rows: EntryPointRows = {
  actions: [
    { file: "app/(shop)/outbox/actions.ts", exportName: "retryMail", spec: retryMailAction as AnySpec, allowed: MAIL_READERS, sample: () => ({ messageId: 1 }) },
  ],
  routes: [],
};
