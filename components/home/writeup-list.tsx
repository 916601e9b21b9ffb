import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";

export function WriteupList({ items }: { items: { id: number; title: string; summary: string }[] }) {
  if (items.length === 0) return <EmptyState title="No write-ups published yet." />;
  return (
    <ul className="flex flex-col gap-3">
      {items.map((w) => (
        <li key={w.id}>
          <Link href={`/writeups/${w.id}`} className="font-medium">{w.title}</Link>
          <p className="text-sm text-ink-soft">{w.summary}</p>
        </li>
      ))}
    </ul>
  );
}
