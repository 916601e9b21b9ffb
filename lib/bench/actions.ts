import "server-only";
import { and, eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { benchFindings, causes, FINDING_RESULTS, uploads } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { AppError } from "@/lib/errors";
import { lockCase } from "@/lib/outcomes/status";

export const findingInput = z.object({
  caseId: z.coerce.number({ error: "No case given." }).int().positive("No case given."),
  cause: z.string().trim().regex(/^[a-z0-9-]{1,80}$/, "Pick the inspection from the checklist."),
  result: z.enum(FINDING_RESULTS, { error: "Choose found, not found or not done." }),
  photoId: z.preprocess((v) => (v === "" || v === undefined ? null : v), z.string().regex(/^[a-f0-9]{32}$/, "That photo is not one of this case's uploads.").nullable()),
});
export type FindingInput = z.output<typeof findingInput>;

/**
 * Records (or replaces) the result of one inspection on a unit on the bench, with an optional
 * photo already uploaded to the case. The case row is locked first, so two saves for one case
 * queue behind each other and the later one wins.
 */
export const recordFindingAction = defineAction({
  name: "bench.recordFinding",
  access: "bench:record",
  input: findingInput,
  async run(input, { user }) {
    return db.transaction(async (tx) => {
      const c = await lockCase(tx, input.caseId);
      if (c.status !== "on_bench") {
        throw new AppError("conflict", `Findings are recorded while the unit is on the bench; this case is ${c.status.replace("_", " ")}.`);
      }
      const [cause] = await tx.select({ id: causes.id, name: causes.name }).from(causes).where(eq(causes.slug, input.cause)).limit(1);
      if (!cause) throw new AppError("invalid", "That inspection is not in the catalogue any more; reload the page.", { fieldErrors: { cause: "Unknown cause." } });
      if (input.photoId) {
        const [photo] = await tx.select({ id: uploads.id }).from(uploads)
          .where(and(eq(uploads.id, input.photoId), eq(uploads.caseId, c.id))).limit(1);
        if (!photo) throw new AppError("invalid", "That photo is not one of this case's uploads.", { fieldErrors: { photoId: "Upload the photo again." } });
      }
      const values = { result: input.result, photoId: input.photoId, recordedBy: user.id || null, recordedAt: new Date() };
      await tx.insert(benchFindings).values({ caseId: c.id, causeId: cause.id, ...values })
        .onConflictDoUpdate({ target: [benchFindings.caseId, benchFindings.causeId], set: values });
      const said = input.result === "found" ? "found" : input.result === "not_found" ? "not found" : "not done";
      return { ok: true as const, data: { caseId: c.id, cause: input.cause, result: input.result }, message: `${cause.name}: ${said}.` };
    });
  },
});
