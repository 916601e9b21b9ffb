import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { MailStatus } from "@/components/outbox/mail-status";
import type { OutboxRow } from "@/lib/mail/outbox";

/** E-mails queued for this case, with where they stand. */
export function CaseMail({ messages, canOpen }: { messages: OutboxRow[]; canOpen: boolean }) {
  if (messages.length === 0) return <EmptyState title="No e-mail for this case." />;
  return (
    <ul className="flex flex-col gap-2 text-sm" data-testid="case-mail">
      {messages.map((m) => (
        <li key={m.id} className="flex flex-wrap items-baseline gap-x-3">
          <MailStatus status={m.status} />
          {canOpen ? <Link href={`/outbox/${m.id}`}>{m.subject}</Link> : <span>{m.subject}</span>}
          <span className="text-ink-soft">to {m.toAddress}</span>
          {m.status !== "sent" && m.attempts > 0 ? <span className="text-xs text-ink-faint">{m.attempts} attempt{m.attempts > 1 ? "s" : ""}</span> : null}
        </li>
      ))}
    </ul>
  );
}
