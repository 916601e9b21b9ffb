import Link from "next/link";

const TONES = {
  cause: "bg-copper-light text-copper-dark",
  family: "bg-moss-light text-moss",
  part: "bg-paper-deep text-ink-soft",
  tag: "border border-ink-faint/40 text-ink-soft",
} as const;

export type ChipTone = keyof typeof TONES;

export function Chip({ tone, children, href }: { tone: ChipTone; children: React.ReactNode; href?: string }) {
  const className = `inline-flex items-center rounded-full px-2.5 py-0.5 text-xs font-medium no-underline hover:no-underline ${TONES[tone]}`;
  return href ? <Link href={href} className={`${className} hover:ring-1 hover:ring-current`}>{children}</Link> : <span className={className}>{children}</span>;
}

export function ChipRow({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div>
      <p className="mb-1 text-xs uppercase tracking-wide text-ink-faint">{label}</p>
      <div className="flex flex-wrap gap-1.5">{children}</div>
    </div>
  );
}

export function StatusBadge({ status }: { status: "draft" | "published" }) {
  return status === "published"
    ? <span className="rounded bg-moss-light px-2 py-0.5 text-xs font-semibold uppercase tracking-wide text-moss">Published</span>
    : <span className="rounded bg-amber-light px-2 py-0.5 text-xs font-semibold uppercase tracking-wide text-amber">Draft</span>;
}
