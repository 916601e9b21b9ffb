import "server-only";
import { z } from "zod";
import { defineAction } from "@/lib/actions/define";
import { retryNow } from "./outbox";

export const retryMailAction = defineAction({
  name: "mail.retry",
  access: "outbox:read",
  input: z.object({ messageId: z.coerce.number().int().positive("No message given.") }),
  async run(input) {
    await retryNow(input.messageId);
    return { ok: true as const, data: { id: input.messageId }, message: "Queued again; the mail worker tries it on its next pass." };
  },
});
