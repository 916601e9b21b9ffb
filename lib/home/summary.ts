import "server-only";
import { and, count, desc, eq, gte, ne } from "drizzle-orm";
import { db } from "@/db";
import { cases, mailOutbox, users, writeups } from "@/db/schema";

export async function openCases(technicianId?: string, limit = 8) {
  const where = technicianId ? and(ne(cases.status, "closed"), eq(cases.technicianId, technicianId)) : ne(cases.status, "closed");
  return db
    .select({ id: cases.id, reference: cases.reference, status: cases.status, callerName: cases.callerName, symptom: cases.symptom, createdAt: cases.createdAt })
    .from(cases)
    .where(where)
    .orderBy(desc(cases.createdAt))
    .limit(limit);
}

export async function recentWriteups(limit = 5) {
  return db
    .select({ id: writeups.id, slug: writeups.slug, title: writeups.title, summary: writeups.summary, publishedAt: writeups.publishedAt })
    .from(writeups)
    .where(eq(writeups.status, "published"))
    .orderBy(desc(writeups.publishedAt))
    .limit(limit);
}

export async function draftWriteups(limit = 8) {
  return db
    .select({ id: writeups.id, title: writeups.title, updatedAt: writeups.updatedAt })
    .from(writeups)
    .where(eq(writeups.status, "draft"))
    .orderBy(desc(writeups.updatedAt))
    .limit(limit);
}

export async function shopCounts() {
  const monthStart = new Date();
  monthStart.setUTCDate(1);
  monthStart.setUTCHours(0, 0, 0, 0);
  const [[open], [closedThisMonth], [activeUsers], [queuedMail]] = await Promise.all([
    db.select({ n: count() }).from(cases).where(ne(cases.status, "closed")),
    db.select({ n: count() }).from(cases).where(and(eq(cases.status, "closed"), gte(cases.closedAt, monthStart))),
    db.select({ n: count() }).from(users).where(eq(users.active, true)),
    db.select({ n: count() }).from(mailOutbox).where(eq(mailOutbox.status, "queued")),
  ]);
  return { open: open.n, closedThisMonth: closedThisMonth.n, activeUsers: activeUsers.n, queuedMail: queuedMail.n };
}
