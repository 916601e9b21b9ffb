import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { Panel } from "@/components/ui/panel";
import { formatDay } from "@/lib/format";

export function DraftList({ drafts, userId }: {
  drafts: { id: number; title: string; updatedAt: Date; authorId: string | null; authorName: string | null }[];
  userId: string;
}) {
  return (
    <Panel title="Drafts (not in the search until published)">
      {drafts.length === 0 ? <EmptyState title="No drafts waiting." /> : (
        <ul className="divide-y divide-ink-faint/20" data-testid="draft-list">
          {drafts.map((d) => (
            <li key={d.id} className="flex flex-wrap items-baseline justify-between gap-2 py-2">
              <Link href={`/writeups/${d.id}`} className="font-medium">{d.title}</Link>
              <span className="text-sm text-ink-faint">
                {d.authorId === userId ? "yours" : d.authorName ?? "unknown author"} · saved {formatDay(d.updatedAt)}
              </span>
            </li>
          ))}
        </ul>
      )}
    </Panel>
  );
}
