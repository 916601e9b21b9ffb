import type { TocEntry } from "@/lib/markdown/render";

export function TableOfContents({ entries }: { entries: TocEntry[] }) {
  const top = Math.min(...entries.map((e) => e.depth));
  return (
    <nav aria-label="Contents" className="text-sm">
      <p className="mb-1 text-xs uppercase tracking-wide text-ink-faint">Contents</p>
      <ol className="flex flex-col gap-1">
        {entries.filter((e) => e.depth <= top + 1).map((e) => (
          <li key={e.id} className={e.depth > top ? "pl-3" : ""}>
            <a href={`#${e.id}`} className="text-ink-soft hover:text-copper-dark">{e.text}</a>
          </li>
        ))}
      </ol>
    </nav>
  );
}
