import Link from "next/link";
import { PracticeCaseList } from "@/components/practice/practice-case-list";
import { requireRole } from "@/lib/auth/require-role";
import { listPracticeCases } from "@/lib/practice/queries";

const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

export default async function PracticePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireRole("practice:run", "/practice");
  const params = await searchParams;
  const family = one(params.family) || undefined;
  const page = Math.max(1, Number.parseInt(one(params.page) ?? "1", 10) || 1);
  const list = await listPracticeCases(user.id, { page, family });
  const pageHref = (p: number) => `/practice?${new URLSearchParams({ ...(family ? { family } : {}), page: String(p) })}`;
  return (
    <div className="flex flex-col gap-5">
      <div>
        <h1>Practice cases</h1>
        <p className="max-w-3xl text-ink-soft">
          Replay a closed call: the questions the technician asked and what the caller said, one answer at a time, with the
          engine&apos;s ranking as it moves. Commit to a cause, then see what the bench found. Practice changes no real case
          and no shop statistic.
        </p>
      </div>
      <form method="get" className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor="practice-family" className="text-sm font-medium text-ink-soft">Motor family</label>
          <select id="practice-family" name="family" defaultValue={family ?? ""} className="rounded-md border border-ink-faint/50 bg-white px-2 py-1.5 text-sm">
            <option value="">Any</option>
            {list.families.map((f) => <option key={f.slug} value={f.slug}>{f.name}</option>)}
          </select>
        </div>
        <button type="submit" className="rounded-md border border-ink-faint/50 bg-white px-3 py-1.5 text-sm hover:bg-paper">Show</button>
        <p className="text-sm text-ink-faint">{list.total} case{list.total === 1 ? "" : "s"} to practise on</p>
      </form>
      <PracticeCaseList rows={list.rows} />
      {list.pages > 1 ? (
        <nav aria-label="Pages" className="flex items-center gap-3 text-sm">
          {list.page > 1 ? <Link href={pageHref(list.page - 1)}>← Newer</Link> : null}
          <span className="text-ink-faint">Page {list.page} of {list.pages}</span>
          {list.page < list.pages ? <Link href={pageHref(list.page + 1)}>Older →</Link> : null}
        </nav>
      ) : null}
    </div>
  );
}
