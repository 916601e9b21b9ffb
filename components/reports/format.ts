export const pct = (x: number, digits = 1) => `${(x * 100).toFixed(digits)} %`;
export const interval = (low: number, high: number) => `${(low * 100).toFixed(1)}–${(high * 100).toFixed(1)} %`;
export const num = (x: number, digits = 3) => x.toFixed(digits);
export const whole = new Intl.NumberFormat("en-GB");

const monthName = new Intl.DateTimeFormat("en-GB", { month: "short", year: "numeric", timeZone: "UTC" });
/** "2025-03" → "Mar 2025" */
export const monthLabel = (m: string) => monthName.format(new Date(`${m}-01T00:00:00Z`));
