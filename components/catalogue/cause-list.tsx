import Link from "next/link";
import type { CauseArea } from "@/db/schema";
import type { CauseWithParts } from "@/lib/catalogue/queries";
import { AREA_LABELS } from "@/lib/catalogue/areas";
import { minutes, priceBand } from "@/lib/format";

export function CauseList({ causes, canEdit, highlight }: { causes: CauseWithParts[]; canEdit: boolean; highlight?: string }) {
  const byArea = new Map<CauseArea, CauseWithParts[]>();
  for (const area of Object.keys(AREA_LABELS) as CauseArea[]) {
    const list = causes.filter((c) => c.area === area);
    if (list.length) byArea.set(area, list);
  }
  return (
    <div className="flex flex-col gap-6">
      <nav aria-label="Areas" className="flex flex-wrap gap-2 text-sm">
        {[...byArea].map(([area, list]) => <a key={area} href={`#area-${area}`} className="rounded border border-ink-faint/40 px-2 py-0.5">{AREA_LABELS[area]} ({list.length})</a>)}
      </nav>
      {[...byArea].map(([area, list]) => (
        <section key={area} aria-labelledby={`area-${area}`}>
          <h3 id={`area-${area}`} className="mb-2 text-base font-semibold">{AREA_LABELS[area]} <span className="font-normal text-ink-faint">({list.length})</span></h3>
          <ul className="grid gap-3 lg:grid-cols-2">
            {list.map((c) => (
              <li key={c.slug} id={`cause-${c.slug}`} className={`rounded-md border p-3 ${c.slug === highlight ? "border-moss bg-moss-light/40" : "border-ink-faint/30"} ${c.active ? "" : "opacity-70"}`}>
                <div className="flex items-start justify-between gap-2">
                  <div>
                    <p className="font-medium">{c.name}{c.active ? "" : <span className="ml-2 rounded bg-paper-deep px-1.5 text-xs text-ink-soft">retired</span>}</p>
                    <p className="font-mono text-xs text-ink-faint">{c.slug}</p>
                  </div>
                  {canEdit ? <Link href={`/catalogue/causes/${c.slug}`} className="text-sm">Edit</Link> : null}
                </div>
                {c.description ? <p className="mt-1 text-sm text-ink-soft">{c.description}</p> : null}
                <dl className="mt-2 grid grid-cols-2 gap-x-4 gap-y-1 text-xs sm:grid-cols-4">
                  <div><dt className="text-ink-faint">Inspection</dt><dd className="font-medium">{minutes(c.inspectMinutes)}</dd></div>
                  <div><dt className="text-ink-faint">Typical labour</dt><dd className="font-medium">{minutes(c.labourMinutes)}</dd></div>
                  <div><dt className="text-ink-faint">Price band</dt><dd className="font-medium">{priceBand(c.priceLowCents, c.priceHighCents)}</dd></div>
                  {c.ratingNm ? <div><dt className="text-ink-faint">Rating</dt><dd className="font-medium">{c.ratingNm} N·m</dd></div> : null}
                </dl>
                {c.parts.length ? (
                  <p className="mt-2 text-xs text-ink-soft"><span className="text-ink-faint">Parts: </span>{c.parts.map((p) => `${p.quantity > 1 ? `${p.quantity} × ` : ""}${p.name}`).join(", ")}</p>
                ) : <p className="mt-2 text-xs text-ink-faint">No parts listed.</p>}
              </li>
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
