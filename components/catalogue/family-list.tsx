import Link from "next/link";
import type { FamilyRow } from "@/lib/catalogue/queries";

export function FamilyList({ families, makers }: { families: FamilyRow[]; makers: { slug: string; name: string; blurb: string }[] }) {
  return (
    <div className="grid gap-4 md:grid-cols-2">
      {makers.map((m) => {
        const list = families.filter((f) => f.makerSlug === m.slug);
        return (
          <section key={m.slug} className="rounded-md border border-ink-faint/30 p-3">
            <h3 className="font-semibold">{m.name}</h3>
            {m.blurb ? <p className="text-xs text-ink-soft">{m.blurb}</p> : null}
            <ul className="mt-2 flex flex-col gap-2">
              {list.map((f) => (
                <li key={f.slug} className="text-sm">
                  <span className="font-medium">{f.name} {f.generation}</span> <span className="text-xs text-ink-faint">{f.years}</span>
                  {" "}<Link href={`/catalogue/families/${f.slug}`} className="text-xs">stages</Link>
                  {f.notes ? <p className="text-xs text-ink-soft">{f.notes}</p> : null}
                </li>
              ))}
            </ul>
          </section>
        );
      })}
    </div>
  );
}
