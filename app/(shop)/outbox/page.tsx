import type { Metadata } from "next";
import { OutboxTable } from "@/components/outbox/outbox-table";
import { Panel, Stat } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { MAX_ATTEMPTS } from "@/lib/mail/backoff";
import { listOutbox, outboxCounts } from "@/lib/mail/outbox";

export const metadata: Metadata = { title: "Outbox" };
export const dynamic = "force-dynamic";

export default async function OutboxPage() {
  await requireRole("outbox:read", "/outbox");
  const [rows, counts] = await Promise.all([listOutbox(), outboxCounts()]);
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1>Outbox</h1>
        <p className="text-ink-soft">
          Every e-mail is stored here before it is sent, so a mail server that is down loses nothing. The mail worker
          retries with growing pauses (30 s, 1 min, 2 min, …) and gives up after {MAX_ATTEMPTS} attempts; “Retry now” tries again at once.
        </p>
      </div>
      <div className="grid gap-4 sm:grid-cols-3">
        <Stat label="Waiting to send" value={counts.queued} />
        <Stat label="Sent" value={counts.sent} />
        <Stat label="Failed" value={counts.failed} />
      </div>
      <Panel title="Messages"><OutboxTable rows={rows} /></Panel>
    </div>
  );
}
