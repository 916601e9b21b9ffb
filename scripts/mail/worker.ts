// Sends what the outbox holds: polls mail_outbox every MAIL_POLL_MS (default 2000) and delivers
// over SMTP (SMTP_HOST, SMTP_PORT). Failures are retried with backoff; several workers may run
// against one database, each message goes once (see lib/mail/deliver.ts).
import { sql } from "../../db";
import { outboxDeliverer } from "../../lib/mail/deliver";
import { smtpConfigFromEnv, smtpTransport } from "../../lib/mail/transport";
import { loadShop, shopSender } from "../../lib/cases/shop";
import { exitWithParents } from "../../lib/mail/exit-with-parents";
import { sweepOrphans } from "../../lib/storage/sweep";

const pollMs = Number(process.env.MAIL_POLL_MS ?? 2000);
// The same worker clears stored files that no upload row points at (see lib/storage/sweep.ts).
const sweepMs = Number(process.env.STORAGE_SWEEP_MINUTES ?? 30) * 60_000;
let lastSweep = 0;
let running = true;

async function main() {
  const config = smtpConfigFromEnv();
  const transport = smtpTransport(config);
  // The shop's name and address as set up now (the first administrator enters them after the worker starts).
  const from = async () => process.env.MAIL_FROM ?? shopSender(await loadShop());
  const deliverer = outboxDeliverer(transport, { from });
  console.log(`[mail-worker] sending to ${config.host}:${config.port} every ${pollMs} ms as ${process.env.MAIL_FROM ? "MAIL_FROM" : "the shop"}`);
  while (running) {
    try {
      const report = await deliverer.deliverDue();
      if (report.sent || report.retrying || report.failed) console.log(`[mail-worker] sent ${report.sent}, retrying ${report.retrying}, failed ${report.failed}`);
    } catch (error) {
      console.error("[mail-worker] pass failed:", error instanceof Error ? error.message : error);
    }
    if (Date.now() - lastSweep > sweepMs) {
      lastSweep = Date.now();
      await sweepOrphans().then(
        (removed) => { if (removed.length) console.log(`[mail-worker] removed ${removed.length} stored files no upload points at`); },
        (error: unknown) => console.error("[mail-worker] storage sweep failed:", error instanceof Error ? error.message : error),
      );
    }
    await new Promise((resolve) => setTimeout(resolve, pollMs));
  }
  transport.close();
  await sql.end({ timeout: 5 });
}

const stop = () => { running = false; };
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
exitWithParents(() => { stop(); setTimeout(() => process.exit(0), pollMs + 5000).unref(); });
main().catch((error: unknown) => {
  console.error("[mail-worker] stopped:", error);
  process.exit(1);
});
