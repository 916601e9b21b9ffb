import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";

export interface CaseListItem {
  id: number;
  reference: string;
  status: string;
  callerName: string;
  symptom: string;
  createdAt: Date;
}

export function CaseList({ items, empty }: { items: CaseListItem[]; empty: string }) {
  if (items.length === 0) return <EmptyState title={empty} />;
  return (
    <ul className="divide-y divide-ink-faint/20">
      {items.map((c) => (
        <li key={c.id} className="flex items-baseline justify-between gap-3 py-2">
          <Link href={`/cases/${c.id}`} className="shrink-0 whitespace-nowrap font-medium">{c.reference}</Link>
          <span className="min-w-0 flex-1 truncate text-sm text-ink-soft">{c.callerName} — {c.symptom}</span>
          <span className="shrink-0 whitespace-nowrap rounded bg-paper-deep px-2 py-0.5 text-xs">{c.status.replace("_", " ")}</span>
        </li>
      ))}
    </ul>
  );
}
