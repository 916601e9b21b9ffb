import Link from "next/link";
import { FamilySelect } from "./family-select";
import { filterQuery, PRESET_MONTHS, type ReportFilter } from "@/lib/reports/period";

/** Period presets as links, the family and a custom range as plain GET forms: the report lives in its URL. */
export function ReportFilterBar({ path, filter, families, exportHref }: {
  /** The reports page the links and forms lead back to. */
  path: string;
  filter: ReportFilter;
  families: { slug: string; name: string }[];
  exportHref: string | null;
}) {
  const input = "rounded-md border border-ink-faint/50 bg-white px-3 py-2 font-normal text-ink";
  const button = "rounded-md border border-ink-soft px-4 py-2 font-medium text-ink hover:bg-paper-deep";
  return (
    <div className="flex flex-col gap-4">
      <nav aria-label="Report period" className="flex flex-wrap items-center gap-2">
        <span className="text-sm font-medium text-ink-soft">Period:</span>
        {PRESET_MONTHS.map((m) => {
          const active = filter.period.preset === m;
          return (
            <Link
              key={m}
              href={`${path}?${filterQuery(filter, { preset: m })}`}
              aria-current={active ? "page" : undefined}
              className={`rounded-full border px-3 py-1 text-sm no-underline ${active ? "border-copper bg-copper text-white" : "border-ink-faint/50 text-ink hover:bg-paper-deep"}`}
            >
              Last {m} months
            </Link>
          );
        })}
      </nav>
      <div className="flex flex-wrap items-end gap-x-6 gap-y-3">
        <form method="get" action={path} aria-label="Motor family" className="flex flex-wrap items-end gap-2">
          {filter.period.preset !== null ? <input type="hidden" name="last" value={filter.period.preset} /> : (
            <>
              <input type="hidden" name="from" value={filter.period.fromDay} />
              <input type="hidden" name="to" value={filter.period.toDay} />
            </>
          )}
          <FamilySelect value={filter.familySlug} families={families} className={input} />
          <button type="submit" className={button}>Show</button>
        </form>
        {/* Keyed by the period: a preset link navigates in place, and the date fields must show its dates, not the ones typed before. */}
        <form key={`${filter.period.fromDay}/${filter.period.toDay}`} method="get" action={path} aria-label="Custom period" className="flex flex-wrap items-end gap-2">
          {filter.familySlug ? <input type="hidden" name="family" value={filter.familySlug} /> : null}
          <label className="flex flex-col gap-1 text-sm font-medium text-ink-soft">
            From
            <input type="date" name="from" defaultValue={filter.period.fromDay} required className={input} />
          </label>
          <label className="flex flex-col gap-1 text-sm font-medium text-ink-soft">
            To
            <input type="date" name="to" defaultValue={filter.period.toDay} required className={input} />
          </label>
          <button type="submit" className={button}>Show period</button>
        </form>
        {exportHref ? (
          <a href={exportHref} download className="ml-auto rounded-md bg-copper px-4 py-2 font-medium text-white no-underline shadow-sm hover:bg-copper-dark" data-testid="export-csv">
            Export cases as CSV
          </a>
        ) : null}
      </div>
    </div>
  );
}
