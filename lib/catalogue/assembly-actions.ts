import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { z } from "zod";
import { db, type Tx } from "@/db";
import { ASSEMBLY_CAUTIONS, assemblies, causeLocations, causes, motorFamilies } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { DiagnosisError, teardownPlan } from "@/lib/diagnosis";
import { AppError } from "@/lib/errors";

const slug = (what: string) => z.string().trim().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, `The ${what} is lower-case letters, digits and dashes.`).max(80, `Keep the ${what} under 80 characters.`);
const minutes = (what: string) =>
  z.coerce.number({ error: `Enter the ${what} in whole minutes.` }).int(`Enter the ${what} in whole minutes.`)
    .min(0, `The ${what} cannot be negative.`).max(600, `The ${what} must be at most 600 minutes.`);

export const assemblyInput = z.object({
  family: slug("motor family"),
  originalSlug: z.string().trim().max(80).optional().default(""),
  slug: slug("stage key"),
  name: z.string().trim().min(1, "Name the stage.").max(120, "Keep the name under 120 characters."),
  parent: z.string().trim().max(80).default(""),
  openMinutes: minutes("opening time"),
  closeMinutes: minutes("closing time"),
  caution: z.enum(ASSEMBLY_CAUTIONS, { error: "Pick the stage's caution." }),
});

/** The family row, locked so two edits of one family's stages queue behind each other. */
async function lockFamily(tx: Tx, familySlug: string): Promise<number> {
  const rows = await tx.execute<{ id: number }>(sql`select id from ${motorFamilies} where slug = ${familySlug} for update`);
  if (!rows[0]) throw new AppError("not_found", "That motor family does not exist.");
  return rows[0].id;
}

/** Refuses a change that would leave the family without exactly one root, or with a cycle. */
async function checkStages(tx: Tx, familyId: number): Promise<void> {
  const rows = await tx.select({ id: assemblies.id, parentId: assemblies.parentId, openMinutes: assemblies.openMinutes })
    .from(assemblies).where(eq(assemblies.familyId, familyId));
  if (rows.length === 0) return;
  try {
    teardownPlan(rows.map((r) => ({ id: String(r.id), parent: r.parentId === null ? null : String(r.parentId), openMinutes: r.openMinutes })), []);
  } catch (error) {
    if (!(error instanceof DiagnosisError)) throw error;
    const message = error.code === "several_roots" ? "Only the unit as received may have no parent: pick a parent stage."
      : error.code === "cycle" ? "A stage cannot sit inside itself or inside one of its own inner stages."
      : "The unit needs one outermost stage (no parent).";
    throw new AppError("invalid", message, { fieldErrors: { parent: message } });
  }
}

/** Adds a stage to a family's unit, or edits the one named by originalSlug. */
export const saveAssemblyAction = defineAction({
  name: "catalogue.saveAssembly",
  access: "catalogue:edit",
  input: assemblyInput,
  async run(input) {
    return db.transaction(async (tx) => {
      const familyId = await lockFamily(tx, input.family);
      const editing = input.originalSlug !== "";
      let parentId: number | null = null;
      if (input.parent) {
        if (input.parent === (editing ? input.originalSlug : input.slug)) {
          throw new AppError("invalid", "A stage cannot sit inside itself.", { fieldErrors: { parent: "Pick another parent." } });
        }
        const [p] = await tx.select({ id: assemblies.id }).from(assemblies)
          .where(and(eq(assemblies.familyId, familyId), eq(assemblies.slug, input.parent))).limit(1);
        if (!p) throw new AppError("invalid", "Pick the parent from this family's stages.", { fieldErrors: { parent: "Unknown stage." } });
        parentId = p.id;
      }
      const values = { name: input.name, parentId, openMinutes: input.openMinutes, closeMinutes: input.closeMinutes, caution: input.caution };
      if (editing) {
        if (input.slug !== input.originalSlug) throw new AppError("invalid", "A stage's key cannot change.", { fieldErrors: { slug: "Keys stay as they were created." } });
        const [row] = await tx.update(assemblies).set(values)
          .where(and(eq(assemblies.familyId, familyId), eq(assemblies.slug, input.originalSlug))).returning({ id: assemblies.id });
        if (!row) throw new AppError("not_found", "That stage does not exist.");
      } else {
        const [taken] = await tx.select({ id: assemblies.id }).from(assemblies)
          .where(and(eq(assemblies.familyId, familyId), eq(assemblies.slug, input.slug))).limit(1);
        if (taken) throw new AppError("conflict", "This family already has a stage with that key.", { fieldErrors: { slug: "Already in use." } });
        const [{ next }] = await tx.execute<{ next: number }>(sql`select coalesce(max(position), -1) + 1 as next from ${assemblies} where family_id = ${familyId}`);
        await tx.insert(assemblies).values({ familyId, slug: input.slug, position: Number(next), ...values });
      }
      await checkStages(tx, familyId);
      return { ok: true as const, data: { family: input.family, slug: input.slug }, message: editing ? `Saved "${input.name}".` : `Added "${input.name}".` };
    });
  },
});

export const deleteAssemblyInput = z.object({ family: slug("motor family"), slug: slug("stage key") });

/** Removes a stage that has no inner stages and no causes located in it. */
export const deleteAssemblyAction = defineAction({
  name: "catalogue.deleteAssembly",
  access: "catalogue:edit",
  input: deleteAssemblyInput,
  async run(input) {
    return db.transaction(async (tx) => {
      const familyId = await lockFamily(tx, input.family);
      const [row] = await tx.select({ id: assemblies.id, name: assemblies.name }).from(assemblies)
        .where(and(eq(assemblies.familyId, familyId), eq(assemblies.slug, input.slug))).limit(1);
      if (!row) throw new AppError("not_found", "That stage does not exist.");
      const [inner] = await tx.select({ id: assemblies.id }).from(assemblies).where(eq(assemblies.parentId, row.id)).limit(1);
      if (inner) throw new AppError("conflict", "Remove or move its inner stages first.");
      const [located] = await tx.select({ causeId: causeLocations.causeId }).from(causeLocations).where(eq(causeLocations.assemblyId, row.id)).limit(1);
      if (located) throw new AppError("conflict", "Move the causes inspected in this stage to another stage first.");
      await tx.delete(assemblies).where(eq(assemblies.id, row.id));
      await checkStages(tx, familyId);
      return { ok: true as const, data: { family: input.family, slug: input.slug }, message: `Removed "${row.name}".` };
    });
  },
});

export const locationInput = z.object({
  family: slug("motor family"),
  cause: slug("cause"),
  stage: slug("stage key"),
  inspectMinutes: minutes("inspection time"),
});

/** Where a cause is inspected in a family's unit, and how long that takes once the stage is open. */
export const saveLocationAction = defineAction({
  name: "catalogue.saveLocation",
  access: "catalogue:edit",
  input: locationInput,
  async run(input) {
    return db.transaction(async (tx) => {
      const familyId = await lockFamily(tx, input.family);
      const [cause] = await tx.select({ id: causes.id, name: causes.name }).from(causes).where(eq(causes.slug, input.cause)).limit(1);
      if (!cause) throw new AppError("invalid", "Pick a cause from the catalogue.", { fieldErrors: { cause: "Unknown cause." } });
      const [stage] = await tx.select({ id: assemblies.id }).from(assemblies)
        .where(and(eq(assemblies.familyId, familyId), eq(assemblies.slug, input.stage))).limit(1);
      if (!stage) throw new AppError("invalid", "Pick one of this family's stages.", { fieldErrors: { stage: "Unknown stage." } });
      const values = { assemblyId: stage.id, inspectMinutes: input.inspectMinutes };
      await tx.insert(causeLocations).values({ familyId, causeId: cause.id, ...values })
        .onConflictDoUpdate({ target: [causeLocations.familyId, causeLocations.causeId], set: values });
      return { ok: true as const, data: { family: input.family, cause: input.cause }, message: `${cause.name}: saved.` };
    });
  },
});
