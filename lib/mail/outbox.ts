import "server-only";
import { and, desc, eq, sql as dsql } from "drizzle-orm";
import { db, type Db, type Tx } from "@/db";
import { cases, mailOutbox, type OutboxMessage } from "@/db/schema";
import { AppError } from "@/lib/errors";

export interface NewMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  caseId?: number;
}

/** Queues a message; call it inside the transaction whose change the message reports. */
export async function enqueueMail(conn: Db | Tx, mail: NewMail): Promise<number> {
  const [row] = await conn.insert(mailOutbox).values({
    toAddress: mail.to, subject: mail.subject, textBody: mail.text, htmlBody: mail.html ?? null, caseId: mail.caseId ?? null,
  }).returning({ id: mailOutbox.id });
  return row.id;
}

export type OutboxRow = Pick<OutboxMessage, "id" | "toAddress" | "subject" | "status" | "attempts" | "nextAttemptAt" | "lastError" | "createdAt" | "sentAt" | "caseId"> & {
  caseReference: string | null;
};

const listColumns = {
  id: mailOutbox.id, toAddress: mailOutbox.toAddress, subject: mailOutbox.subject, status: mailOutbox.status,
  attempts: mailOutbox.attempts, nextAttemptAt: mailOutbox.nextAttemptAt, lastError: mailOutbox.lastError,
  createdAt: mailOutbox.createdAt, sentAt: mailOutbox.sentAt, caseId: mailOutbox.caseId, caseReference: cases.reference,
};

export async function listOutbox(limit = 200): Promise<OutboxRow[]> {
  return db.select(listColumns).from(mailOutbox).leftJoin(cases, eq(cases.id, mailOutbox.caseId))
    .orderBy(desc(mailOutbox.createdAt), desc(mailOutbox.id)).limit(limit);
}

export async function outboxCounts(): Promise<Record<"queued" | "sent" | "failed", number>> {
  const rows = await db.select({ status: mailOutbox.status, n: dsql<number>`count(*)::int` }).from(mailOutbox).groupBy(mailOutbox.status);
  const out = { queued: 0, sent: 0, failed: 0 };
  for (const r of rows) out[r.status] = r.n;
  return out;
}

export async function caseMail(caseId: number): Promise<OutboxRow[]> {
  return db.select(listColumns).from(mailOutbox).leftJoin(cases, eq(cases.id, mailOutbox.caseId))
    .where(eq(mailOutbox.caseId, caseId)).orderBy(desc(mailOutbox.createdAt));
}

export async function outboxMessage(id: number): Promise<(OutboxMessage & { caseReference: string | null }) | null> {
  const [row] = await db.select({ message: mailOutbox, caseReference: cases.reference }).from(mailOutbox)
    .leftJoin(cases, eq(cases.id, mailOutbox.caseId)).where(eq(mailOutbox.id, id)).limit(1);
  return row ? { ...row.message, caseReference: row.caseReference } : null;
}

/**
 * Puts a failed or waiting message back at the front of the queue for one more try. A message a
 * worker holds (its send may be under way right now) is left to that worker, so it cannot go twice.
 */
export async function retryNow(id: number): Promise<void> {
  const rows = await db.update(mailOutbox).set({ status: "queued", nextAttemptAt: dsql`now()` })
    .where(and(eq(mailOutbox.id, id), dsql`${mailOutbox.status} <> 'sent'`,
      dsql`(${mailOutbox.claimedUntil} is null or ${mailOutbox.claimedUntil} <= now())`))
    .returning({ id: mailOutbox.id });
  if (rows.length === 0) {
    const exists = await outboxMessage(id);
    if (!exists) throw new AppError("not_found", "That message does not exist.");
    if (exists.status === "sent") throw new AppError("conflict", "That message has been sent already.");
    throw new AppError("conflict", "The mail worker is sending that message right now; look again in a minute.");
  }
}
