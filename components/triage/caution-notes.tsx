import type { ViewNode } from "@/lib/triage/walk-view";

/** Caution nodes the walk has passed: their text is read to the caller or followed at the bench. */
export function CautionNotes({ cautions }: { cautions: ViewNode[] }) {
  if (cautions.length === 0) return null;
  return (
    <ul className="flex flex-col gap-2" data-testid="cautions">
      {cautions.map((c) => (
        <li key={c.key}>
          {/* The note role sits inside the item: a list may hold only list items. */}
          <div role="note" className="rounded-lg border-l-4 border-amber bg-amber-light p-4">
            <p className="font-semibold">{c.title}</p>
            <p className="mt-1 text-ink">{c.cautionText}</p>
          </div>
        </li>
      ))}
    </ul>
  );
}
