const STYLE = { queued: "bg-amber-light text-amber", sent: "bg-moss-light text-moss", failed: "bg-danger-light text-danger" } as const;

export function MailStatus({ status }: { status: keyof typeof STYLE }) {
  return <span data-testid="mail-status" className={`rounded px-2 py-0.5 text-xs font-medium ${STYLE[status]}`}>{status}</span>;
}
