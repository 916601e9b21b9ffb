import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import type { OutboxRow } from "@/lib/mail/outbox";
import { MailStatus } from "./mail-status";
import { RetryButton } from "./retry-button";
import { ScrollRegion } from "@/components/ui/scroll-region";

const when = (d: Date | null) => (d ? d.toISOString().slice(0, 16).replace("T", " ") : "—");

/** Every queued, sent and failed message, newest first. */
export function OutboxTable({ rows }: { rows: OutboxRow[] }) {
  if (rows.length === 0) return <EmptyState title="The outbox is empty.">Summaries to callers appear here when a triage is finished.</EmptyState>;
  return (
    <ScrollRegion label="Outbox messages" className="overflow-x-auto">
      <table className="w-full text-left text-sm" data-testid="outbox-table">
        <thead className="text-xs uppercase tracking-wide text-ink-soft">
          <tr><th className="px-2 py-1">Queued (UTC)</th><th className="px-2 py-1">To</th><th className="px-2 py-1">Subject</th><th className="px-2 py-1">Case</th><th className="px-2 py-1">Status</th><th className="px-2 py-1">Attempts</th><th className="px-2 py-1">Next try / sent</th><th className="px-2 py-1" /></tr>
        </thead>
        <tbody className="divide-y divide-ink-faint/20">
          {rows.map((m) => (
            <tr key={m.id} data-testid="outbox-row" className="align-top">
              <td className="px-2 py-2 whitespace-nowrap">{when(m.createdAt)}</td>
              <td className="px-2 py-2">{m.toAddress}</td>
              <td className="px-2 py-2"><Link href={`/outbox/${m.id}`}>{m.subject}</Link>{m.lastError && m.status !== "sent" ? <span className="block text-xs text-danger">{m.lastError}</span> : null}</td>
              <td className="px-2 py-2 font-mono">{m.caseId ? <Link href={`/cases/${m.caseId}`}>{m.caseReference}</Link> : "—"}</td>
              <td className="px-2 py-2"><MailStatus status={m.status} /></td>
              <td className="px-2 py-2">{m.attempts}</td>
              <td className="px-2 py-2 whitespace-nowrap">{m.status === "sent" ? when(m.sentAt) : m.status === "queued" ? when(m.nextAttemptAt) : "stopped"}</td>
              <td className="px-2 py-2">{m.status !== "sent" ? <RetryButton messageId={m.id} /> : null}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
