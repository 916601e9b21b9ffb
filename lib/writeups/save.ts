import "server-only";
import { and, eq, inArray, isNull, like, or, sql } from "drizzle-orm";
import { db, type Tx } from "@/db";
import { cases, causes, motorFamilies, parts, uploads, writeupCauses, writeupFamilies, writeupParts, writeups } from "@/db/schema";
import { may } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";
import { AppError } from "@/lib/errors";
import { uploadIdsIn } from "@/lib/storage/urls";
import { mayEditWriteup } from "./access";
import type { WriteupInput } from "./input";
import { firstFreeSlug, slugify } from "./slug";

async function assertIdsExist(tx: Tx, ids: number[], table: typeof causes | typeof parts | typeof motorFamilies, field: string, what: string) {
  if (ids.length === 0) return;
  const found = await tx.select({ id: table.id }).from(table).where(inArray(table.id, ids));
  if (found.length !== new Set(ids).size) {
    throw new AppError("invalid", `One of the ${what} is not in the catalogue; reload the page.`, { fieldErrors: { [field]: `Unknown ${what}.` } });
  }
}

/** Publishing needs what makes a write-up findable: at least one motor family and one cause. */
export function publishProblems(links: { familyCount: number; causeCount: number }): Record<string, string> {
  const problems: Record<string, string> = {};
  if (links.familyCount === 0) problems.familyIds = "Pick at least one motor family before publishing.";
  if (links.causeCount === 0) problems.causeIds = "Pick at least one cause before publishing.";
  return problems;
}

async function caseIdOf(tx: Tx, reference: string): Promise<number | null> {
  if (!reference) return null;
  const [row] = await tx.select({ id: cases.id }).from(cases).where(eq(cases.reference, reference)).limit(1);
  if (!row) throw new AppError("invalid", "No case has that reference.", { fieldErrors: { caseReference: "No case has that reference." } });
  return row.id;
}

async function freeSlug(tx: Tx, title: string): Promise<string> {
  const base = slugify(title);
  const taken = await tx.select({ slug: writeups.slug }).from(writeups).where(or(eq(writeups.slug, base), like(writeups.slug, `${base}-%`)));
  return firstFreeSlug(base, taken.map((t) => t.slug));
}

async function replaceLinks(tx: Tx, writeupId: number, input: WriteupInput): Promise<void> {
  await tx.delete(writeupFamilies).where(eq(writeupFamilies.writeupId, writeupId));
  await tx.delete(writeupCauses).where(eq(writeupCauses.writeupId, writeupId));
  await tx.delete(writeupParts).where(eq(writeupParts.writeupId, writeupId));
  const unique = (ids: number[]) => [...new Set(ids)];
  if (input.familyIds.length) await tx.insert(writeupFamilies).values(unique(input.familyIds).map((familyId) => ({ writeupId, familyId })));
  if (input.causeIds.length) await tx.insert(writeupCauses).values(unique(input.causeIds).map((causeId) => ({ writeupId, causeId })));
  if (input.partIds.length) await tx.insert(writeupParts).values(unique(input.partIds).map((partId) => ({ writeupId, partId })));
  // Photos uploaded in the editor before the write-up existed become its photos once its body uses them.
  const photoIds = uploadIdsIn(input.body);
  if (photoIds.length) {
    await tx.update(uploads).set({ writeupId }).where(and(inArray(uploads.id, photoIds), isNull(uploads.writeupId), isNull(uploads.caseId)));
  }
}

/**
 * Creates or updates a write-up with its links, all in one transaction: a refused save leaves
 * nothing behind. Technicians save drafts; publishing is for seniors and admins.
 */
export async function saveWriteup(input: WriteupInput, user: SessionUser): Promise<{ id: number; status: "draft" | "published" }> {
  const publish = input.intent === "publish";
  if (publish && !may(user.role, "writeup:publish")) {
    throw new AppError("forbidden", "Only a senior mechanic or an administrator may publish. Save it as a draft for review.");
  }
  if (publish) {
    const problems = publishProblems({ familyCount: input.familyIds.length, causeCount: input.causeIds.length });
    if (Object.keys(problems).length) throw new AppError("invalid", "Not ready to publish yet.", { fieldErrors: problems });
  }
  return db.transaction(async (tx) => {
    await assertIdsExist(tx, input.familyIds, motorFamilies, "familyIds", "motor families");
    await assertIdsExist(tx, input.causeIds, causes, "causeIds", "causes");
    await assertIdsExist(tx, input.partIds, parts, "partIds", "parts");
    const caseId = await caseIdOf(tx, input.caseReference);
    const now = new Date();
    const status = publish ? ("published" as const) : ("draft" as const);
    const fields = { title: input.title, summary: input.summary, body: input.body, tags: input.tags, caseId, status, updatedAt: now };

    if (input.id === undefined) {
      const [row] = await tx
        .insert(writeups)
        .values({
          ...fields, slug: await freeSlug(tx, input.title), authorId: user.id, createdAt: now,
          publishedAt: publish ? now : null, publishedBy: publish ? user.id : null,
        })
        .returning({ id: writeups.id });
      await replaceLinks(tx, row.id, input);
      return { id: row.id, status };
    }

    const [current] = await tx.select().from(writeups).where(eq(writeups.id, input.id)).for("update").limit(1);
    if (!current) throw new AppError("not_found", "That write-up does not exist any more.");
    if (!mayEditWriteup(user, current)) throw new AppError("forbidden", "You may not change this write-up.");
    if (input.expectedUpdatedAt && new Date(input.expectedUpdatedAt).getTime() !== current.updatedAt.getTime()) {
      throw new AppError("conflict", "Someone saved this write-up after you opened it. Copy your text, reload the page and apply your changes again.");
    }
    await tx
      .update(writeups)
      .set({
        ...fields,
        publishedAt: publish ? (current.publishedAt ?? now) : null,
        publishedBy: publish ? (current.status === "published" ? current.publishedBy : user.id) : null,
      })
      .where(eq(writeups.id, current.id));
    await replaceLinks(tx, current.id, input);
    return { id: current.id, status };
  });
}

/** Publishes a draft as it stands (the button on the article page). */
export async function publishWriteup(id: number, user: SessionUser): Promise<{ id: number }> {
  return db.transaction(async (tx) => {
    const [current] = await tx.select().from(writeups).where(eq(writeups.id, id)).for("update").limit(1);
    if (!current) throw new AppError("not_found", "That write-up does not exist any more.");
    if (current.status === "published") throw new AppError("conflict", "This write-up is already published.");
    const [[families], [causeLinks]] = await Promise.all([
      tx.select({ n: sql<number>`count(*)::int` }).from(writeupFamilies).where(eq(writeupFamilies.writeupId, id)),
      tx.select({ n: sql<number>`count(*)::int` }).from(writeupCauses).where(eq(writeupCauses.writeupId, id)),
    ]);
    const problems = publishProblems({ familyCount: families.n, causeCount: causeLinks.n });
    if (Object.keys(problems).length) {
      throw new AppError("invalid", `Not ready to publish: ${Object.values(problems).join(" ")} Open the editor to add them.`);
    }
    const now = new Date();
    await tx.update(writeups).set({ status: "published", publishedAt: now, publishedBy: user.id, updatedAt: now }).where(eq(writeups.id, id));
    return { id };
  });
}
