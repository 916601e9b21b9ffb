const DAY = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

/** Dates the same on the server and in the browser, whatever either's time zone. */
export function formatDay(value: Date | string | null | undefined): string {
  if (!value) return "";
  return DAY.format(typeof value === "string" ? new Date(value) : value);
}
