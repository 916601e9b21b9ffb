import "server-only";
import { and, eq, ne } from "drizzle-orm";
import { db } from "@/db";
import { cases } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { AppError } from "@/lib/errors";
import { notesInput } from "./inputs";

/** Notes save as the technician types; closed cases keep the notes they closed with. */
export const saveNotesAction = defineAction({
  name: "cases.saveNotes",
  access: "case:work",
  input: notesInput,
  async run(input) {
    const rows = await db
      .update(cases)
      .set({ notes: input.notes, updatedAt: new Date() })
      .where(and(eq(cases.id, input.caseId), ne(cases.status, "closed")))
      .returning({ id: cases.id, updatedAt: cases.updatedAt });
    if (rows.length === 0) {
      const [exists] = await db.select({ id: cases.id }).from(cases).where(eq(cases.id, input.caseId)).limit(1);
      throw exists ? new AppError("conflict", "This case is closed; its notes can no longer change.") : new AppError("not_found", "That case does not exist.");
    }
    return { savedAt: rows[0].updatedAt.toISOString() };
  },
});
