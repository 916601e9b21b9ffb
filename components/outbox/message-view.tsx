import Link from "next/link";
import type { OutboxMessage } from "@/db/schema";
import { MailStatus } from "./mail-status";
import { RetryButton } from "./retry-button";
import { ScrollRegion } from "@/components/ui/scroll-region";

const when = (d: Date | null) => (d ? `${d.toISOString().slice(0, 19).replace("T", " ")} UTC` : "—");

/** One message as stored: envelope, delivery state, the text body and the HTML version. */
export function MessageView({ message }: { message: OutboxMessage & { caseReference: string | null } }) {
  return (
    <div className="flex flex-col gap-4" data-testid="outbox-message">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-faint">To</dt><dd>{message.toAddress}</dd>
        <dt className="text-ink-faint">Subject</dt><dd className="font-medium">{message.subject}</dd>
        <dt className="text-ink-faint">Case</dt><dd>{message.caseId ? <Link href={`/cases/${message.caseId}`}>{message.caseReference}</Link> : "—"}</dd>
        <dt className="text-ink-faint">Status</dt><dd className="flex items-center gap-3"><MailStatus status={message.status} />{message.status !== "sent" ? <RetryButton messageId={message.id} /> : null}</dd>
        <dt className="text-ink-faint">Attempts</dt><dd>{message.attempts}{message.lastError ? <span className="text-danger"> · last error: {message.lastError}</span> : null}</dd>
        <dt className="text-ink-faint">Queued</dt><dd>{when(message.createdAt)}</dd>
        <dt className="text-ink-faint">{message.status === "sent" ? "Sent" : "Next try"}</dt><dd>{message.status === "sent" ? when(message.sentAt) : message.status === "queued" ? when(message.nextAttemptAt) : "stopped"}</dd>
      </dl>
      <section>
        <h3 className="text-sm font-semibold text-ink-soft">Text</h3>
        <pre className="mt-1 whitespace-pre-wrap rounded-md border border-ink-faint/30 bg-paper p-3 font-sans text-sm" data-testid="outbox-text">{message.textBody}</pre>
      </section>
      {message.htmlBody ? (
        <details>
          <summary className="cursor-pointer text-sm font-semibold text-ink-soft">HTML version (source)</summary>
          <ScrollRegion label="HTML source" className="mt-1 max-h-96 overflow-auto rounded-md border border-ink-faint/30 bg-white">
            <pre className="whitespace-pre-wrap p-3 font-mono text-xs">{message.htmlBody}</pre>
          </ScrollRegion>
        </details>
      ) : null}
    </div>
  );
}
