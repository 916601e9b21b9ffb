import type { TreeListRow } from "@/lib/trees/queries";

const STYLES: Record<TreeListRow["status"], { label: string; className: string }> = {
  published: { label: "Published", className: "bg-moss-light text-moss" },
  draft: { label: "Draft only", className: "bg-amber-light text-amber" },
  both: { label: "Published + draft", className: "bg-copper-light text-copper-dark" },
  empty: { label: "No versions", className: "bg-paper-deep text-ink-soft" },
};

export function StatusBadge({ status }: { status: TreeListRow["status"] }) {
  const s = STYLES[status];
  return <span className={`inline-block whitespace-nowrap rounded px-2 py-0.5 text-xs font-medium ${s.className}`}>{s.label}</span>;
}

export function ProblemCount({ n }: { n: number }) {
  if (n === 0) return <span className="text-ink-faint">none</span>;
  return <span className="inline-block rounded bg-danger-light px-2 py-0.5 text-xs font-semibold text-danger">{n} open</span>;
}

export function VersionBadge({ state, number }: { state: "draft" | "published"; number: number }) {
  return (
    <span className={`inline-block rounded border px-1.5 py-0.5 font-mono text-xs ${state === "draft" ? "border-amber text-amber" : "border-moss text-moss"}`}>
      v{number} {state === "draft" ? "draft" : "published"}
    </span>
  );
}
