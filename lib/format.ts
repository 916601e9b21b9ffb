// How Rootbench writes numbers, money, durations and dates, on the server and in the browser alike.

/* ---------- shares ---------- */

/** The space between a number and its % sign: a no-break space, so a line never wraps between them. */
const PERCENT = "\u00a0%";

/** "42 %"; a share above zero but under half a percent reads "<1 %" rather than "0 %". */
export const percent = (p: number) => (p > 0 && p < 0.005 ? `<1${PERCENT}` : `${Math.round(p * 100)}${PERCENT}`);

/** "42.5 %" with a fixed number of decimals, for report tables. */
export const pct = (x: number, digits = 1) => `${(x * 100).toFixed(digits)}${PERCENT}`;

/** Small shares keep one decimal ("4.2 %"), larger ones none ("42 %"). */
export const percentFine = (p: number) => `${(p * 100).toFixed(p < 0.1 ? 1 : 0)}${PERCENT}`;

/** A confidence interval, "12.3–18.9 %". */
export const interval = (low: number, high: number) => `${(low * 100).toFixed(1)}–${(high * 100).toFixed(1)}${PERCENT}`;

export const num = (x: number, digits = 3) => x.toFixed(digits);
export const whole = new Intl.NumberFormat("en-GB");
export const bits = (b: number) => `${b.toFixed(2)} bits`;

/* ---------- money (cents in, euros out) ---------- */

const eurWhole = new Intl.NumberFormat("en-IE", { style: "currency", currency: "EUR", maximumFractionDigits: 0 });
const eurCents = new Intl.NumberFormat("en-IE", { style: "currency", currency: "EUR", minimumFractionDigits: 2 });

/** "€165" for whole euros, "€12.50" otherwise. */
export function money(cents: number): string {
  return cents % 100 === 0 ? eurWhole.format(cents / 100) : eurCents.format(cents / 100);
}

/** Always with cents, "€12.00": prices in a parts list. */
export function euros(cents: number): string {
  return eurCents.format(cents / 100);
}

/** A price band, "€160–€260"; one figure when both ends agree. */
export function priceBand(lowCents: number, highCents: number): string {
  if (lowCents === highCents) return money(lowCents);
  return `${money(lowCents)}–${money(highCents)}`;
}

/* ---------- durations ---------- */

/** "1 h 15 min", "40 min". */
export function minutes(total: number): string {
  if (total < 60) return `${total} min`;
  const h = Math.floor(total / 60);
  const m = total % 60;
  return m ? `${h} h ${m} min` : `${h} h`;
}

/* ---------- dates ---------- */

const DAY = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
const DAY_TIME = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" });
const CLOCK = new Intl.DateTimeFormat("en-GB", { hour: "2-digit", minute: "2-digit", hour12: false });
const MONTH = new Intl.DateTimeFormat("en-GB", { month: "short", year: "numeric", timeZone: "UTC" });

/** "3 Dec 2026", the same on the server and in the browser, whatever either's time zone. */
export function formatDay(value: Date | string | null | undefined): string {
  if (!value) return "";
  return DAY.format(typeof value === "string" ? new Date(value) : value);
}

/** "3 Dec 2026, 14:05" in the server's time zone: the shop's clock for a one-shop install. */
export const formatDayTime = (at: Date) => DAY_TIME.format(at);

/** "14:05" in the server's time zone. */
export const clockTime = (at: Date) => CLOCK.format(at);

/** "2025-03" → "Mar 2025" */
export const monthLabel = (m: string) => MONTH.format(new Date(`${m}-01T00:00:00Z`));

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
