export const pct = (x: number, digits = 1) => `${(x * 100).toFixed(digits)}\u00a0%`;
export const interval = (low: number, high: number) => `${(low * 100).toFixed(1)}–${(high * 100).toFixed(1)}\u00a0%`;
export const num = (x: number, digits = 3) => x.toFixed(digits);
export const whole = new Intl.NumberFormat("en-GB");

const monthName = new Intl.DateTimeFormat("en-GB", { month: "short", year: "numeric", timeZone: "UTC" });
/** "2025-03" → "Mar 2025" */
export const monthLabel = (m: string) => monthName.format(new Date(`${m}-01T00:00:00Z`));

/** Month labels for a period, with an asterisk on a first or last month the period only partly covers. */
export function monthLabels(months: string[], fromDay: string, toDay: string): Map<string, string> {
  const out = new Map(months.map((m) => [m, monthLabel(m)]));
  const first = months[0];
  const last = months[months.length - 1];
  if (first && !fromDay.endsWith("-01")) out.set(first, `${monthLabel(first)}*`);
  const end = new Date(`${toDay}T00:00:00Z`);
  const lastDayOfMonth = new Date(Date.UTC(end.getUTCFullYear(), end.getUTCMonth() + 1, 0)).getUTCDate();
  if (last && end.getUTCDate() !== lastDayOfMonth) out.set(last, `${monthLabel(last)}*`);
  return out;
}

export const PARTIAL_MONTH_NOTE = "* Only part of the month falls in the period.";
