import "server-only";
import { sql } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { settings } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { WARRANTY_SETTINGS_KEY } from "./warranty";

export const warrantyInput = z.object({
  months: z.coerce.number({ error: "Enter the warranty in whole months." })
    .int("Use whole months.")
    .min(1, "At least one month.")
    .max(60, "At most 60 months."),
});

/** The shop's warranty period on repairs, in months from closing; it decides which returns are warranty returns. */
export const saveWarrantyAction = defineAction({
  name: "survival.saveWarranty",
  access: "settings:edit",
  input: warrantyInput,
  async run(input) {
    const value = { months: input.months };
    await db.insert(settings).values({ key: WARRANTY_SETTINGS_KEY, value })
      .onConflictDoUpdate({ target: settings.key, set: { value, updatedAt: sql`now()` } });
    return { ok: true as const, data: value, message: `Warranty set to ${input.months} months.` };
  },
});
