import { RIDING_USES } from "@/db/schema";
import { FamilySelect } from "@/components/reports/family-select";
import { FOLLOW_UP_MONTHS, type SurvivalFilter } from "@/lib/survival/filter";

/** Family, riding use and how far back repairs are taken, as a plain GET form: the page lives in its URL. */
export function SurvivalFilterBar({ filter, families }: { filter: SurvivalFilter; families: { slug: string; name: string }[] }) {
  const input = "rounded-md border border-ink-faint/50 bg-white px-3 py-2 font-normal text-ink";
  const label = "flex flex-col gap-1 text-sm font-medium text-ink-soft";
  return (
    <form method="get" action="/reports/lasting" aria-label="Which repairs" className="flex flex-wrap items-end gap-3">
      <FamilySelect value={filter.familySlug} families={families} className={input} />
      <label className={label}>
        Riding use
        <select name="use" defaultValue={filter.ridingUse ?? ""} className={input}>
          <option value="">All uses</option>
          {RIDING_USES.map((u) => <option key={u} value={u}>{u}</option>)}
        </select>
      </label>
      <label className={label}>
        Repairs closed in the last
        <select name="last" defaultValue={String(filter.months)} className={input}>
          {FOLLOW_UP_MONTHS.map((m) => <option key={m} value={m}>{m} months</option>)}
        </select>
      </label>
      <button type="submit" className="rounded-md border border-ink-soft px-4 py-2 font-medium text-ink hover:bg-paper-deep">Show</button>
    </form>
  );
}
