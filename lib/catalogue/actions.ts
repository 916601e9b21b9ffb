import "server-only";
import { eq, inArray } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { CAUSE_AREAS, causeParts, causes, parts, type CauseArea } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { slugSchema } from "@/lib/trees/file/schema";
import { AppError } from "@/lib/errors";
import { sqlState } from "@/lib/trees/sql-state";

const whole = (what: string, min: number, max: number) =>
  z.coerce.number({ error: `Enter the ${what} in whole minutes.` }).int(`Enter the ${what} in whole minutes.`)
    .min(min, `The ${what} must be at least ${min} minute${min === 1 ? "" : "s"}.`).max(max, `The ${what} must be at most ${max} minutes.`);

/** "160", "160.5" or "160,50" euros → cents. */
const euros = (what: string) =>
  z.string().trim()
    .regex(/^\d{1,6}([.,]\d{1,2})?$/, `Enter the ${what} in euros, like 160 or 160.50.`)
    .transform((v) => Math.round(Number(v.replace(",", ".")) * 100));

const toList = (v: unknown) => (v === undefined ? [] : Array.isArray(v) ? v : [v]);

export const causeInput = z
  .object({
    originalSlug: z.string().trim().optional().default(""),
    slug: z.string().trim().pipe(slugSchema.max(80, "Keep the slug under 80 characters.")),
    name: z.string().trim().min(1, "Name the cause.").max(120, "Keep the name under 120 characters."),
    area: z.enum(CAUSE_AREAS as unknown as [CauseArea, ...CauseArea[]], { error: "Pick the area of the unit." }),
    description: z.string().trim().max(4000, "Keep the description under 4,000 characters."),
    inspectMinutes: whole("inspection time", 1, 24 * 60),
    labourMinutes: whole("typical labour", 0, 24 * 60),
    priceLow: euros("lower price"),
    priceHigh: euros("upper price"),
    ratingNm: z.preprocess((v) => (v === "" || v === undefined ? null : v),
      z.coerce.number({ error: "Enter the rating in N·m, or leave it empty." }).int("Enter whole N·m.").positive("A rating is above 0.").max(10000).nullable()),
    active: z.preprocess((v) => v === "on" || v === "true" || v === true, z.boolean()),
    partSlug: z.preprocess(toList, z.array(z.string().trim())),
    partQty: z.preprocess(toList, z.array(z.string().trim())),
  })
  .superRefine((v, ctx) => {
    if (v.priceHigh < v.priceLow) ctx.addIssue({ code: "custom", path: ["priceHigh"], message: "The upper price must not be below the lower one." });
    const seen = new Set<string>();
    v.partSlug.forEach((slug, i) => {
      if (!slug) return;
      if (seen.has(slug)) ctx.addIssue({ code: "custom", path: ["parts"], message: "Each part may be listed once; add to its quantity instead." });
      seen.add(slug);
      const q = Number(v.partQty[i] ?? "1");
      if (!Number.isInteger(q) || q < 1 || q > 99) ctx.addIssue({ code: "custom", path: ["parts"], message: "Each part needs a whole quantity from 1 to 99." });
    });
  })
  .transform(({ partSlug, partQty, ...rest }) => ({
    ...rest,
    parts: partSlug.flatMap((slug, i) => (slug ? [{ slug, quantity: Number(partQty[i] ?? "1") }] : [])),
  }));

/**
 * Creates a cause, or edits the one named by originalSlug. A slug never changes once made:
 * trees and learned likelihoods refer to causes by it.
 */
export const saveCauseAction = defineAction({
  name: "catalogue.saveCause",
  access: "catalogue:edit",
  input: causeInput,
  async run(input) {
    const editing = input.originalSlug !== "";
    if (editing && input.slug !== input.originalSlug) {
      throw new AppError("invalid", "A cause's slug cannot change.", { fieldErrors: { slug: "Slugs stay as they were created." } });
    }
    try {
      const slug = await db.transaction(async (tx) => {
        const partRows = input.parts.length
          ? await tx.select({ id: parts.id, slug: parts.slug }).from(parts).where(inArray(parts.slug, input.parts.map((p) => p.slug)))
          : [];
        const partId = new Map(partRows.map((p) => [p.slug, p.id]));
        const missing = input.parts.filter((p) => !partId.has(p.slug));
        if (missing.length) throw new AppError("invalid", "Pick parts from the list.", { fieldErrors: { parts: `Unknown part: ${missing.map((p) => p.slug).join(", ")}.` } });
        const values = {
          name: input.name, area: input.area, description: input.description, inspectMinutes: input.inspectMinutes,
          labourMinutes: input.labourMinutes, priceLowCents: input.priceLow, priceHighCents: input.priceHigh,
          ratingNm: input.ratingNm, active: input.active,
        };
        let causeId: number;
        if (editing) {
          const [row] = await tx.update(causes).set(values).where(eq(causes.slug, input.originalSlug)).returning({ id: causes.id });
          if (!row) throw new AppError("not_found", "That cause does not exist.");
          causeId = row.id;
          await tx.delete(causeParts).where(eq(causeParts.causeId, causeId));
        } else {
          const [row] = await tx.insert(causes).values({ slug: input.slug, ...values }).returning({ id: causes.id });
          causeId = row.id;
        }
        if (input.parts.length) {
          await tx.insert(causeParts).values(input.parts.map((p) => ({ causeId, partId: partId.get(p.slug)!, quantity: p.quantity })));
        }
        return input.slug;
      });
      return { ok: true as const, data: { slug }, message: editing ? `Saved "${input.name}".` : `Added "${input.name}" to the catalogue.` };
    } catch (error) {
      if (sqlState(error) === "23505") throw new AppError("conflict", "Another cause already uses that slug.", { fieldErrors: { slug: "Already in use." } });
      throw error;
    }
  },
});
