import { EmptyState } from "@/components/ui/empty-state";

export interface EventView {
  id: number;
  kind: string;
  fromStatus: string | null;
  toStatus: string | null;
  note: string;
  at: Date;
  by: string | null;
}

const when = (d: Date) => d.toISOString().slice(0, 16).replace("T", " ");
const label = (s: string) => s.replace(/_/g, " ");

/** The case's status history, oldest first. */
export function EventList({ events }: { events: EventView[] }) {
  if (events.length === 0) return <EmptyState title="No history yet." />;
  return (
    <ol className="flex flex-col gap-2 text-sm" data-testid="case-events">
      {events.map((e) => (
        <li key={e.id} className="border-l-2 border-copper/50 pl-3">
          <p>
            <span className="font-medium">{label(e.kind)}</span>
            {e.toStatus && e.fromStatus ? <span className="text-ink-soft"> · {label(e.fromStatus)} → {label(e.toStatus)}</span> : null}
          </p>
          {e.note ? <p className="text-ink-soft">{e.note}</p> : null}
          <p className="text-xs text-ink-faint">{when(e.at)} UTC · {e.by ?? "system"}</p>
        </li>
      ))}
    </ol>
  );
}
