import Link from "next/link";
import type { RepeatLink } from "@/lib/outcomes/repeat";

/** The repeat-return flag: same serial, same family, within 90 days — shown on both cases. */
export function RepeatFlag({ serial, links }: { serial: string; links: RepeatLink[] }) {
  if (links.length === 0) return null;
  return (
    <div role="note" data-testid="repeat-flag" className="rounded-md border border-danger/40 bg-danger-light/60 p-3 text-sm">
      <p className="font-medium text-danger">Repeat return</p>
      <ul className="mt-1 flex flex-col gap-0.5">
        {links.map((l) => (
          <li key={l.id}>
            {l.direction === "earlier"
              ? <>This unit (serial {serial}) was in {Math.abs(l.days)} days before as <Link href={`/cases/${l.id}`}>{l.reference}</Link>.</>
              : <>This unit (serial {serial}) came back {l.days} days later as <Link href={`/cases/${l.id}`}>{l.reference}</Link>.</>}
          </li>
        ))}
      </ul>
    </div>
  );
}
