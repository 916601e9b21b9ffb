import Link from "next/link";

/** A plain GET form: the filters live in the URL, so a filtered list can be linked and reloaded. */
export function TreeFilters({ q, status, family, families }: {
  q: string;
  status: string;
  family: string;
  families: { slug: string; label: string }[];
}) {
  const input = "rounded-md border border-ink-faint/50 bg-white px-3 py-2";
  return (
    <form method="get" role="search" className="flex flex-wrap items-end gap-3" aria-label="Filter trees">
      <label className="flex flex-col gap-1 text-sm font-medium text-ink-soft">
        Search
        <input name="q" type="search" defaultValue={q} placeholder="symptom or title" className={`${input} w-64 font-normal text-ink`} />
      </label>
      <label className="flex flex-col gap-1 text-sm font-medium text-ink-soft">
        Status
        <select name="status" defaultValue={status} className={`${input} font-normal text-ink`}>
          <option value="all">Any</option>
          <option value="published">Has a published version</option>
          <option value="draft">Has a draft</option>
          <option value="both">Published with a draft open</option>
        </select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-medium text-ink-soft">
        Motor family
        <select name="family" defaultValue={family} className={`${input} font-normal text-ink`}>
          <option value="">Any</option>
          {families.map((f) => <option key={f.slug} value={f.slug}>{f.label}</option>)}
        </select>
      </label>
      <button type="submit" className="rounded-md border border-ink-soft px-4 py-2 font-medium text-ink hover:bg-paper-deep">Apply</button>
      {q || status !== "all" || family ? <Link href="/trees" className="py-2 text-sm">Clear</Link> : null}
    </form>
  );
}
