import type { CaseStatus } from "@/db/schema";

const STYLE: Record<CaseStatus, string> = {
  open: "bg-copper-light text-copper-dark",
  advised: "bg-moss-light text-moss",
  booked_in: "bg-amber-light text-amber",
  on_bench: "bg-paper-deep text-ink",
  closed: "bg-ink/10 text-ink-soft",
};

export const STATUS_LABEL: Record<CaseStatus, string> = {
  open: "in triage", advised: "advised", booked_in: "booked in", on_bench: "on the bench", closed: "closed",
};

export function StatusBadge({ status }: { status: CaseStatus }) {
  return <span data-testid="case-status" data-status={status} className={`rounded px-2 py-0.5 text-xs font-medium ${STYLE[status]}`}>{STATUS_LABEL[status]}</span>;
}
