import "server-only";
import { aliasedTable, asc, desc, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { cases, causes, motorFamilies, motorMakers, parts, uploads, users, writeupCauses, writeupFamilies, writeupParts, writeups } from "@/db/schema";
import type { SessionUser } from "@/lib/auth/session-user";
import { AppError } from "@/lib/errors";
import { mayEditWriteup, mayReadWriteup } from "./access";

const publisher = aliasedTable(users, "publisher");
/** A family as people name it: "Skarn Gen 1" style, model name and generation. */
const familyLabel = sql<string>`${motorFamilies.name} || ' ' || ${motorFamilies.generation}`;

/** One write-up with everything its page shows; 404 when absent, 403 when this role may not read it. */
export async function getWriteup(id: number, user: SessionUser) {
  const [row] = await db
    .select({
      writeup: writeups,
      authorName: users.name,
      publisherName: publisher.name,
      caseReference: cases.reference,
    })
    .from(writeups)
    .leftJoin(users, eq(users.id, writeups.authorId))
    .leftJoin(publisher, eq(publisher.id, writeups.publishedBy))
    .leftJoin(cases, eq(cases.id, writeups.caseId))
    .where(eq(writeups.id, id))
    .limit(1);
  if (!row) throw new AppError("not_found", "No such write-up.");
  if (!mayReadWriteup(user.role, row.writeup.status)) throw new AppError("forbidden", "Drafts are for staff only.");
  const [familyRows, causeRows, partRows, photos] = await Promise.all([
    db.select({ id: motorFamilies.id, slug: motorFamilies.slug, name: familyLabel })
      .from(writeupFamilies).innerJoin(motorFamilies, eq(motorFamilies.id, writeupFamilies.familyId))
      .where(eq(writeupFamilies.writeupId, id)).orderBy(asc(motorFamilies.name), asc(motorFamilies.generation)),
    db.select({ id: causes.id, slug: causes.slug, name: causes.name })
      .from(writeupCauses).innerJoin(causes, eq(causes.id, writeupCauses.causeId))
      .where(eq(writeupCauses.writeupId, id)).orderBy(asc(causes.name)),
    db.select({ id: parts.id, name: parts.name, sku: parts.sku })
      .from(writeupParts).innerJoin(parts, eq(parts.id, writeupParts.partId))
      .where(eq(writeupParts.writeupId, id)).orderBy(asc(parts.name)),
    db.select({ id: uploads.id, originalName: uploads.originalName, width: uploads.width, height: uploads.height })
      .from(uploads).where(eq(uploads.writeupId, id)).orderBy(asc(uploads.createdAt)),
  ]);
  return {
    ...row.writeup,
    authorName: row.authorName,
    publisherName: row.publisherName,
    caseReference: row.caseReference,
    families: familyRows,
    causes: causeRows,
    parts: partRows,
    photos,
    mayEdit: mayEditWriteup(user, row.writeup),
  };
}
export type WriteupView = Awaited<ReturnType<typeof getWriteup>>;

/** The same, for the editor: 403 unless this user may change it. */
export async function getWriteupForEdit(id: number, user: SessionUser): Promise<WriteupView> {
  const writeup = await getWriteup(id, user);
  if (!writeup.mayEdit) throw new AppError("forbidden", "You may not change this write-up.");
  return writeup;
}

/** What the editor's pickers offer. */
export async function writeupFormOptions() {
  const [families, causeRows, partRows, tagRows] = await Promise.all([
    db.select({ id: motorFamilies.id, name: familyLabel, maker: motorMakers.name })
      .from(motorFamilies).innerJoin(motorMakers, eq(motorMakers.id, motorFamilies.makerId))
      .orderBy(asc(motorFamilies.name), asc(motorFamilies.generation)),
    db.select({ id: causes.id, name: causes.name, area: causes.area }).from(causes).where(eq(causes.active, true)).orderBy(asc(causes.name)),
    db.select({ id: parts.id, name: parts.name, sku: parts.sku }).from(parts).orderBy(asc(parts.name)),
    db.execute<{ tag: string }>(sql`select distinct unnest(tags) as tag from writeups order by 1 limit 200`),
  ]);
  return { families, causes: causeRows, parts: partRows, tags: tagRows.map((t) => t.tag) };
}
export type WriteupFormOptions = Awaited<ReturnType<typeof writeupFormOptions>>;

/** Drafts waiting for review, newest first (staff only; the list page checks the role). */
export async function listDrafts(limit = 50) {
  return db
    .select({ id: writeups.id, title: writeups.title, updatedAt: writeups.updatedAt, authorId: writeups.authorId, authorName: users.name })
    .from(writeups)
    .leftJoin(users, eq(users.id, writeups.authorId))
    .where(eq(writeups.status, "draft"))
    .orderBy(desc(writeups.updatedAt))
    .limit(limit);
}
