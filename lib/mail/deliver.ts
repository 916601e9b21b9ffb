import "server-only";
import type { Transporter } from "nodemailer";
import { sql } from "@/db";
import { MAX_ATTEMPTS, retryDelayMs } from "./backoff";

const LEASE_MS = 2 * 60_000;

interface Claimed {
  id: number;
  to_address: string;
  subject: string;
  text_body: string;
  html_body: string | null;
  attempts: number;
}

export interface DeliveryReport {
  sent: number;
  retrying: number;
  failed: number;
}

/**
 * One pass of the mail worker: claims due messages (a lease on next_attempt_at, skip-locked so
 * several workers never take the same one), sends each, then records sent, or the error with
 * exponential backoff, or failed after MAX_ATTEMPTS. A crash mid-send leaves the lease to expire.
 */
export async function deliverDue(transport: Transporter, options: { from: string; now?: Date; batch?: number }): Promise<DeliveryReport> {
  const now = options.now ?? new Date();
  const claimed = await sql<Claimed[]>`
    update mail_outbox set next_attempt_at = ${new Date(now.getTime() + LEASE_MS).toISOString()}::timestamptz
    where id in (
      select id from mail_outbox where status = 'queued' and next_attempt_at <= ${now.toISOString()}::timestamptz
      order by next_attempt_at, id limit ${options.batch ?? 20} for update skip locked
    )
    returning id, to_address, subject, text_body, html_body, attempts`;
  const report: DeliveryReport = { sent: 0, retrying: 0, failed: 0 };
  for (const m of claimed) {
    try {
      await transport.sendMail({ from: options.from, to: m.to_address, subject: m.subject, text: m.text_body, ...(m.html_body ? { html: m.html_body } : {}) });
      await sql`update mail_outbox set status = 'sent', sent_at = now(), attempts = attempts + 1, last_error = null where id = ${m.id}`;
      report.sent++;
    } catch (error) {
      const attempts = m.attempts + 1;
      const message = (error instanceof Error ? error.message : String(error)).slice(0, 500);
      if (attempts >= MAX_ATTEMPTS) {
        await sql`update mail_outbox set status = 'failed', attempts = ${attempts}, last_error = ${message} where id = ${m.id}`;
        report.failed++;
      } else {
        const next = new Date(now.getTime() + retryDelayMs(attempts));
        // Timestamps go as ISO text: drizzle's postgres.js client leaves Date parameters unserialised.
        await sql`update mail_outbox set attempts = ${attempts}, last_error = ${message}, next_attempt_at = ${next.toISOString()}::timestamptz where id = ${m.id}`;
        report.retrying++;
      }
    }
  }
  return report;
}
