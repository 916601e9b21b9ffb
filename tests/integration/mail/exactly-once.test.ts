import { eq, sql } from "drizzle-orm";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { mailOutbox } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { retryMailAction } from "@/lib/mail/actions";
import { outboxDeliverer, type Deliverer } from "@/lib/mail/deliver";
import { enqueueMail } from "@/lib/mail/outbox";
import { smtpTransport } from "@/lib/mail/transport";
import { startAwkwardSmtp, type AwkwardSmtp } from "../../support/awkward-smtp";
import { createUser, db, truncateAll } from "../../support/db";

const FROM = "Test Workshop <bench@workshop.example.test>";
const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

// The first few 'sent' writes fail inside PostgreSQL, after the SMTP server has accepted the
// message: a sequence is not rolled back with the failed statement, so exactly that many fail.
async function failFirstSentWrites(n: number) {
  await db.execute(sql.raw(`
    drop sequence if exists test_sent_write_failures;
    create sequence test_sent_write_failures;
    create or replace function test_fail_sent_write() returns trigger language plpgsql as $$
    begin
      if new.status = 'sent' and old.status <> 'sent' and nextval('test_sent_write_failures') <= ${n} then
        raise exception 'status write refused by the test';
      end if;
      return new;
    end $$;
    drop trigger if exists test_fail_sent_write on mail_outbox;
    create trigger test_fail_sent_write before update on mail_outbox for each row execute function test_fail_sent_write();
  `));
}

async function dropFailures() {
  await db.execute(sql.raw(`
    drop trigger if exists test_fail_sent_write on mail_outbox;
    drop function if exists test_fail_sent_write();
    drop sequence if exists test_sent_write_failures;
  `));
}

/** One worker's loop as scripts/mail/worker.ts runs it: a failed pass is logged there, retried here. */
async function runWorker(worker: Deliverer, until: () => boolean, errors: unknown[]) {
  while (!until()) {
    await worker.deliverDue({ batch: 5 }).catch((error: unknown) => errors.push(error));
    await pause(20);
  }
}

describe("the outbox with two workers and an awkward mail server", () => {
  let smtp: AwkwardSmtp | null = null;
  beforeEach(truncateAll);
  afterEach(async () => {
    await smtp?.close();
    smtp = null;
    await dropFailures();
  });

  it("delivers each message exactly once through slow acceptance, hang-ups, an outage and failed status writes", async () => {
    // Slower than the lease (0.6 s): only the claim's renewal keeps the other worker off a message in flight.
    smtp = await startAwkwardSmtp({ acceptDelayMs: 900, hangUpEvery: 3 });
    const ids: number[] = [];
    for (let i = 0; i < 12; i++) ids.push(await enqueueMail(db, { to: `rider${i}@example.test`, subject: `m${i}`, text: "x" }));
    await failFirstSentWrites(2);

    const transport = smtpTransport({ host: "127.0.0.1", port: smtp.port });
    const workers = [outboxDeliverer(transport, { from: FROM, leaseSeconds: 0.6 }), outboxDeliverer(transport, { from: FROM, leaseSeconds: 0.6 })];
    let done = false;
    const errors: unknown[] = [];
    const running = workers.map((w) => runWorker(w, () => done, errors));

    // The server goes away for a while once a few messages are through, then comes back.
    while (smtp.accepted.length < 3) await pause(20);
    await smtp.down();
    await pause(1500);
    await smtp.up();

    const deadline = Date.now() + 25_000;
    for (;;) {
      const [{ left }] = await db.execute<{ left: number }>(sql`select count(*)::int as left from mail_outbox where status <> 'sent'`);
      if (left === 0 || Date.now() > deadline) break;
      // Time passing: messages the outage pushed into backoff become due (backoff is on the database clock).
      await db.execute(sql`update mail_outbox set next_attempt_at = now() where status = 'queued' and next_attempt_at > now()`);
      await pause(100);
    }
    done = true;
    await Promise.all(running);
    transport.close();

    const rows = await db.select({ id: mailOutbox.id, status: mailOutbox.status, messageId: mailOutbox.messageId }).from(mailOutbox);
    expect(rows.every((r) => r.status === "sent")).toBe(true);
    // Counted at the server: every queued message arrived, none twice.
    expect([...smtp.accepted].sort()).toEqual(rows.map((r) => r.messageId!).sort());
    // The failed status writes really happened and were recorded later instead of resending.
    expect(errors.map((e) => String(e))).toEqual(expect.arrayContaining([expect.stringMatching(/status write refused by the test/)]));
  });

  it("retry now waits while a worker holds the message", async () => {
    smtp = await startAwkwardSmtp({ acceptDelayMs: 800, hangUpEvery: 1000 });
    const id = await enqueueMail(db, { to: "dealer@example.test", subject: "slow", text: "x" });
    const transport = smtpTransport({ host: "127.0.0.1", port: smtp.port });
    const sending = outboxDeliverer(transport, { from: FROM }).deliverDue();
    while ((await db.select({ t: mailOutbox.claimToken }).from(mailOutbox).where(eq(mailOutbox.id, id)))[0].t === null) await pause(10);

    const admin = await createUser("admin");
    const refused = await executeAction(retryMailAction, { messageId: id }, admin);
    expect(refused).toMatchObject({ ok: false, status: 409 });
    expect(await sending).toEqual({ sent: 1, retrying: 0, failed: 0 });
    expect(await executeAction(retryMailAction, { messageId: id }, admin)).toMatchObject({ ok: false, status: 409 });
    transport.close();
    expect(smtp.accepted).toHaveLength(1);
  });
});
