/**
 * The period and motor family a report (and a CSV export) covers, as they travel in the URL:
 * `?last=3|6|12|24` (months up to today) or `?from=YYYY-MM-DD&to=YYYY-MM-DD` (both days included),
 * plus `&family=<slug>`. Anything missing or unreadable falls back to the last 12 months, all families.
 */
export const PRESET_MONTHS = [3, 6, 12, 24] as const;
export type PresetMonths = (typeof PRESET_MONTHS)[number];
export const DEFAULT_PRESET: PresetMonths = 12;
/** No report spans more than ten years; a longer range is cut to its last ten years. */
const MAX_DAYS = 3653;
const DAY_MS = 86_400_000;

export interface ReportPeriod {
  /** First instant included (UTC midnight of the first day). */
  from: Date;
  /** First instant excluded (UTC midnight after the last day). */
  to: Date;
  /** The days as the user sees them, both included. */
  fromDay: string;
  toDay: string;
  preset: PresetMonths | null;
}

export interface ReportFilter {
  period: ReportPeriod;
  familySlug: string | null;
}

type Params = Record<string, string | string[] | undefined> | URLSearchParams;

function first(params: Params, key: string): string | undefined {
  if (params instanceof URLSearchParams) return params.get(key) ?? undefined;
  const v = params[key];
  return Array.isArray(v) ? v[0] : v;
}

export function dayString(d: Date): string {
  return d.toISOString().slice(0, 10);
}

/** A calendar day "YYYY-MM-DD" as UTC midnight, or null when it is not a real day. */
export function parseDay(value: string | undefined): Date | null {
  if (!value || !/^\d{4}-\d{2}-\d{2}$/.test(value)) return null;
  const d = new Date(`${value}T00:00:00Z`);
  return Number.isNaN(d.getTime()) || dayString(d) !== value ? null : d;
}

function startOfDay(d: Date): Date {
  return new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate()));
}

/** The same day `months` earlier, clamped to the month's last day (31 May − 3 months = 28/29 Feb). */
export function monthsBefore(day: Date, months: number): Date {
  const y = day.getUTCFullYear();
  const m = day.getUTCMonth() - months;
  const lastDay = new Date(Date.UTC(y, m + 1, 0)).getUTCDate();
  return new Date(Date.UTC(y, m, Math.min(day.getUTCDate(), lastDay)));
}

export function presetPeriod(months: PresetMonths, today: Date = new Date()): ReportPeriod {
  const end = startOfDay(today);
  const from = monthsBefore(end, months);
  return { from, to: new Date(end.getTime() + DAY_MS), fromDay: dayString(from), toDay: dayString(end), preset: months };
}

export function parsePeriod(params: Params, today: Date = new Date()): ReportPeriod {
  const from = parseDay(first(params, "from"));
  const to = parseDay(first(params, "to"));
  if (from && to && from.getTime() <= to.getTime()) {
    const clampedFrom = to.getTime() - from.getTime() > MAX_DAYS * DAY_MS ? new Date(to.getTime() - MAX_DAYS * DAY_MS) : from;
    return { from: clampedFrom, to: new Date(to.getTime() + DAY_MS), fromDay: dayString(clampedFrom), toDay: dayString(to), preset: null };
  }
  const last = Number(first(params, "last"));
  const preset = (PRESET_MONTHS as readonly number[]).includes(last) ? (last as PresetMonths) : DEFAULT_PRESET;
  return presetPeriod(preset, today);
}

const SLUG = /^[a-z0-9][a-z0-9-]{0,79}$/;

export function parseReportFilter(params: Params, today: Date = new Date()): ReportFilter {
  const family = first(params, "family");
  return { period: parsePeriod(params, today), familySlug: family && SLUG.test(family) ? family : null };
}

/** The query string that reproduces a filter, with optional changes (for links and the export URL). */
export function filterQuery(filter: ReportFilter, change: Partial<{ preset: PresetMonths; familySlug: string | null }> = {}): string {
  const q = new URLSearchParams();
  const preset = change.preset ?? filter.period.preset;
  if (preset !== null) q.set("last", String(preset));
  else {
    q.set("from", filter.period.fromDay);
    q.set("to", filter.period.toDay);
  }
  const family = change.familySlug !== undefined ? change.familySlug : filter.familySlug;
  if (family) q.set("family", family);
  return q.toString();
}

/** Every month (first day, UTC) the period touches, oldest first. */
export function monthsOf(period: ReportPeriod): string[] {
  const out: string[] = [];
  let y = period.from.getUTCFullYear();
  let m = period.from.getUTCMonth();
  const last = new Date(period.to.getTime() - 1);
  while (y < last.getUTCFullYear() || (y === last.getUTCFullYear() && m <= last.getUTCMonth())) {
    out.push(`${y}-${String(m + 1).padStart(2, "0")}`);
    m++;
    if (m === 12) { m = 0; y++; }
  }
  return out;
}
