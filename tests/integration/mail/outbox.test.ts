import net from "node:net";
import { eq, sql } from "drizzle-orm";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { mailOutbox } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { retryMailAction } from "@/lib/mail/actions";
import { MAX_ATTEMPTS, retryDelayMs } from "@/lib/mail/backoff";
import { outboxDeliverer } from "@/lib/mail/deliver";
import { startFakeSmtp, type FakeSmtp } from "@/lib/mail/fake-smtp";
import { enqueueMail } from "@/lib/mail/outbox";
import { smtpTransport } from "@/lib/mail/transport";
import { createUser, db, truncateAll } from "../../support/db";

const FROM = "Test Workshop <bench@workshop.example.test>";

async function freePort(): Promise<number> {
  const server = net.createServer();
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as net.AddressInfo;
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return port;
}

/** Time passing: makes every waiting message due now (backoff and leases run on the database clock). */
async function makeDue() {
  await db.execute(sql`update mail_outbox set next_attempt_at = now() where status = 'queued'`);
}

async function message(id: number) {
  const [row] = await db.select().from(mailOutbox).where(eq(mailOutbox.id, id));
  return row;
}

describe("the mail outbox", () => {
  let fake: FakeSmtp | null = null;
  beforeEach(truncateAll);
  afterEach(async () => {
    await fake?.close();
    fake = null;
  });

  it("keeps a message while the SMTP server is down and sends it when it is back", async () => {
    const port = await freePort(); // nothing listens here yet
    const transport = smtpTransport({ host: "127.0.0.1", port });
    const id = await enqueueMail(db, { to: "rider@example.test", subject: "Your unit — booked in", text: "Hello\nTwo lines, one €.", html: "<p>Hello</p>" });
    const worker = outboxDeliverer(transport, { from: FROM });
    const t0 = Date.now();

    const down = await worker.deliverDue();
    const t1 = Date.now();
    expect(down).toEqual({ sent: 0, retrying: 1, failed: 0 });
    const waiting = await message(id);
    expect(waiting.status).toBe("queued");
    expect(waiting.attempts).toBe(1);
    expect(waiting.lastError).toMatch(/ECONNREFUSED/);
    expect(waiting.nextAttemptAt.getTime()).toBeGreaterThanOrEqual(t0 + retryDelayMs(1) - 5);
    expect(waiting.nextAttemptAt.getTime()).toBeLessThanOrEqual(t1 + retryDelayMs(1) + 5);
    expect(waiting.claimToken).toBeNull();
    expect(waiting.messageId).toMatch(/^<outbox-\d+\.[0-9a-f]+@workshop\.example\.test>$/);

    // Not due yet: a pass before the backoff ends leaves it alone.
    expect(await worker.deliverDue()).toEqual({ sent: 0, retrying: 0, failed: 0 });

    fake = await startFakeSmtp({ port });
    await makeDue();
    const back = await worker.deliverDue();
    expect(back).toEqual({ sent: 1, retrying: 0, failed: 0 });
    const sent = await message(id);
    expect(sent.status).toBe("sent");
    expect(sent.sentAt).toBeInstanceOf(Date);
    expect(sent.lastError).toBeNull();
    expect(fake.messages).toHaveLength(1);
    expect(fake.messages[0].subject).toBe("Your unit — booked in");
    expect(fake.messages[0].envelopeTo).toEqual(["rider@example.test"]);
    expect(fake.messages[0].text).toBe("Hello\nTwo lines, one €.");
    expect(fake.messages[0].html).toBe("<p>Hello</p>");
    // The Message-ID fixed before the first attempt is the one that went out.
    expect(fake.messages[0].raw).toContain(`Message-ID: ${waiting.messageId}`);
    transport.close();
  });

  it("backs off exponentially and marks the message failed after the last attempt; retry now queues it again", async () => {
    // The schedule itself: 30 s doubling, capped at an hour (our rule, checked from its definition).
    expect([1, 2, 3, 4].map(retryDelayMs)).toEqual([30_000, 60_000, 120_000, 240_000]);
    expect(retryDelayMs(20)).toBe(3_600_000);

    // A server that hangs up on every connection, held for the whole test so no other process can
    // take its port between attempts (a merely free port can be reused by something that answers).
    const hangUp = net.createServer((socket) => socket.destroy());
    await new Promise<void>((resolve) => hangUp.listen(0, "127.0.0.1", resolve));
    const transport = smtpTransport({ host: "127.0.0.1", port: (hangUp.address() as net.AddressInfo).port });
    const id = await enqueueMail(db, { to: "dealer@example.test", subject: "s", text: "t" });
    const worker = outboxDeliverer(transport, { from: FROM });
    for (let attempt = 1; attempt <= MAX_ATTEMPTS; attempt++) {
      await makeDue();
      const report = await worker.deliverDue();
      expect(report, `attempt ${attempt}`).toEqual(attempt === MAX_ATTEMPTS ? { sent: 0, retrying: 0, failed: 1 } : { sent: 0, retrying: 1, failed: 0 });
    }
    await new Promise<void>((resolve) => hangUp.close(() => resolve()));
    const failed = await message(id);
    expect(failed.status).toBe("failed");
    expect(failed.attempts).toBe(MAX_ATTEMPTS);

    const admin = await createUser("admin");
    const tech = await createUser("tech");
    expect(await executeAction(retryMailAction, { messageId: id }, tech)).toMatchObject({ ok: false, status: 403 });
    expect((await executeAction(retryMailAction, { messageId: id }, admin)).ok).toBe(true);
    expect((await message(id)).status).toBe("queued");
    transport.close();
  });

  it("reads the sender on every pass, so a shop set up while the worker runs sends as itself", async () => {
    fake = await startFakeSmtp({ port: 0 });
    const transport = smtpTransport({ host: "127.0.0.1", port: fake.port });
    let sender = "Demo Workshop <demo@before.example.test>";
    const worker = outboxDeliverer(transport, { from: async () => sender });
    const before = await enqueueMail(db, { to: "first@example.test", subject: "before", text: "x" });
    expect(await worker.deliverDue()).toEqual({ sent: 1, retrying: 0, failed: 0 });
    sender = "Later Workshop <bench@after.example.test>";
    const after = await enqueueMail(db, { to: "second@example.test", subject: "after", text: "x" });
    expect(await worker.deliverDue()).toEqual({ sent: 1, retrying: 0, failed: 0 });
    expect(fake.messages.map((m) => m.from)).toEqual(["Demo Workshop <demo@before.example.test>", "Later Workshop <bench@after.example.test>"]);
    expect((await message(before)).messageId).toMatch(/@before\.example\.test>$/);
    expect((await message(after)).messageId).toMatch(/@after\.example\.test>$/);
    transport.close();
  });

  it("two workers never send the same message twice", async () => {
    fake = await startFakeSmtp({ port: 0 });
    const transport = smtpTransport({ host: "127.0.0.1", port: fake.port });
    for (let i = 0; i < 5; i++) await enqueueMail(db, { to: `r${i}@example.test`, subject: `m${i}`, text: "x" });
    const workers = [outboxDeliverer(transport, { from: FROM }), outboxDeliverer(transport, { from: FROM })];
    const [a, b] = await Promise.all(workers.map((w) => w.deliverDue({ batch: 3 })));
    // On a loaded machine a send can fail and wait for its backoff; a later pass picks up what is
    // left. What must never happen is a resend.
    await makeDue();
    const later = await workers[0].deliverDue({ batch: 10 });
    expect(a.sent + b.sent + later.sent).toBe(5);
    expect(fake.messages.map((m) => m.subject).sort()).toEqual(["m0", "m1", "m2", "m3", "m4"]);
    transport.close();
  });

  it("the control port lists and clears what the fake caught", async () => {
    fake = await startFakeSmtp({ port: 0, controlPort: 0 });
    const transport = smtpTransport({ host: "127.0.0.1", port: fake.port });
    await transport.sendMail({ from: FROM, to: "a@example.test", subject: "Ünïcode subject", text: "body" });
    const listed = (await (await fetch(`http://127.0.0.1:${fake.controlPort}/messages`)).json()) as { subject: string }[];
    expect(listed.map((m) => m.subject)).toEqual(["Ünïcode subject"]);
    await fetch(`http://127.0.0.1:${fake.controlPort}/messages`, { method: "DELETE" });
    expect(await (await fetch(`http://127.0.0.1:${fake.controlPort}/messages`)).json()).toEqual([]);
    transport.close();
  });
});
