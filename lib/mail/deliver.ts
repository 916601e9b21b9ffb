import "server-only";
import { randomBytes } from "node:crypto";
import type { Transporter } from "nodemailer";
import { sql } from "@/db";
import { MAX_ATTEMPTS, retryDelayMs } from "./backoff";

/** How long a claim holds without being renewed; renewed every third of it while a send runs. */
const LEASE_SECONDS = Number(process.env.MAIL_LEASE_SECONDS ?? 60);

interface Claimed {
  id: number;
  to_address: string;
  subject: string;
  text_body: string;
  html_body: string | null;
  attempts: number;
  message_id: string;
}

export interface DeliveryReport {
  sent: number;
  retrying: number;
  failed: number;
}

export interface Deliverer {
  /** One pass: first records what an earlier pass could not, then sends due messages one by one. */
  deliverDue(options?: { batch?: number }): Promise<DeliveryReport>;
}

/**
 * The outbox worker's sending side. Each message is claimed on its own in PostgreSQL (skip-locked,
 * the lease timed by the database's clock, renewed while its send runs), so two workers never
 * hold one message at once. The Message-ID is fixed at the first claim and sent with the message.
 * Once the SMTP server has accepted a message, the worker keeps that fact until the database has
 * recorded it: a failed status write is retried on the next pass, never turned into a resend.
 * Only a worker that dies between the acceptance and the write leaves a message to be sent again
 * after its lease, with the same Message-ID, which receiving systems use to drop the repeat.
 */
export function outboxDeliverer(
  transport: Transporter,
  options: { from: string | (() => Promise<string>); leaseSeconds?: number },
): Deliverer {
  const token = randomBytes(12).toString("hex");
  const lease = options.leaseSeconds ?? LEASE_SECONDS;
  // Messages the server accepted whose 'sent' is not yet recorded, each with its claim kept alive.
  const acceptedUnrecorded = new Map<number, () => void>();

  async function claimNext(domain: string): Promise<Claimed | null> {
    const suffix = `${randomBytes(8).toString("hex")}@${domain}`;
    const [row] = await sql<Claimed[]>`
      update mail_outbox m
      set claim_token = ${token}, claimed_until = now() + make_interval(secs => ${lease}),
          message_id = coalesce(m.message_id, '<outbox-' || m.id || '.' || ${suffix}::text || '>')
      where m.id = (
        select id from mail_outbox
        where status = 'queued' and next_attempt_at <= now() and (claimed_until is null or claimed_until <= now())
        order by next_attempt_at, id limit 1 for update skip locked
      )
      returning m.id, m.to_address, m.subject, m.text_body, m.html_body, m.attempts, m.message_id`;
    return row ?? null;
  }

  async function recordSent(id: number): Promise<void> {
    // Whoever holds the row now, the server has it: the claim is ours or has lapsed.
    await sql`update mail_outbox set status = 'sent', sent_at = now(), attempts = attempts + 1, last_error = null,
      claim_token = null, claimed_until = null where id = ${id} and status <> 'sent'`;
  }

  async function recordFailure(m: Claimed, error: unknown): Promise<"retrying" | "failed"> {
    const attempts = m.attempts + 1;
    const message = (error instanceof Error ? error.message : String(error)).slice(0, 500);
    if (attempts >= MAX_ATTEMPTS) {
      await sql`update mail_outbox set status = 'failed', attempts = ${attempts}, last_error = ${message},
        claim_token = null, claimed_until = null where id = ${m.id} and claim_token = ${token}`;
      return "failed";
    }
    await sql`update mail_outbox set attempts = ${attempts}, last_error = ${message},
      next_attempt_at = now() + make_interval(secs => ${retryDelayMs(attempts) / 1000}),
      claim_token = null, claimed_until = null where id = ${m.id} and claim_token = ${token}`;
    return "retrying";
  }

  /** Keeps the claim while the SMTP exchange runs, however slow the server is. */
  function holdClaim(id: number): () => void {
    const timer = setInterval(() => {
      sql`update mail_outbox set claimed_until = now() + make_interval(secs => ${lease})
        where id = ${id} and claim_token = ${token}`.catch(() => {});
    }, (lease * 1000) / 3);
    timer.unref();
    return () => clearInterval(timer);
  }

  async function recordAccepted(id: number, report: DeliveryReport): Promise<void> {
    await recordSent(id);
    acceptedUnrecorded.get(id)?.();
    acceptedUnrecorded.delete(id);
    report.sent++;
  }

  return {
    async deliverDue({ batch = 20 } = {}) {
      const report: DeliveryReport = { sent: 0, retrying: 0, failed: 0 };
      for (const id of [...acceptedUnrecorded.keys()]) await recordAccepted(id, report);
      // The sender is read once per pass, so a shop set up or renamed while the worker runs sends as itself.
      const from = typeof options.from === "string" ? options.from : await options.from();
      const domain = /@([^>\s]+)>?\s*$/.exec(from)?.[1] ?? "rootbench.invalid";
      for (let i = 0; i < batch; i++) {
        const m = await claimNext(domain);
        if (!m) break;
        const release = holdClaim(m.id);
        try {
          await transport.sendMail({
            from, to: m.to_address, subject: m.subject, text: m.text_body, messageId: m.message_id,
            ...(m.html_body ? { html: m.html_body } : {}),
          });
        } catch (error) {
          release();
          report[await recordFailure(m, error)]++;
          continue;
        }
        acceptedUnrecorded.set(m.id, release);
        await recordAccepted(m.id, report);
      }
      return report;
    },
  };
}
