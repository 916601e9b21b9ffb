import { describe, expect, it } from "vitest";
import { filterQuery, monthsBefore, monthsOf, parseDay, parseReportFilter } from "@/lib/reports/period";

const today = new Date("2026-05-31T15:00:00Z");

describe("report period from the URL", () => {
  it("a preset runs from the same day N months back to today, both days included", () => {
    const f = parseReportFilter({ last: "3" }, today);
    expect(f.period.fromDay).toBe("2026-02-28"); // 31 May − 3 months clamps to the end of February (common practice, no published source)
    expect(f.period.toDay).toBe("2026-05-31");
    expect(f.period.to.toISOString()).toBe("2026-06-01T00:00:00.000Z");
    expect(f.period.preset).toBe(3);
  });

  it("from/to wins over a preset and includes the last day", () => {
    const f = parseReportFilter({ from: "2025-01-01", to: "2025-06-30", last: "6", family: "orvanta-tessel-2" }, today);
    expect(f.period.from.toISOString()).toBe("2025-01-01T00:00:00.000Z");
    expect(f.period.to.toISOString()).toBe("2025-07-01T00:00:00.000Z");
    expect(f.period.preset).toBeNull();
    expect(f.familySlug).toBe("orvanta-tessel-2");
  });

  it("unreadable values fall back to the last 12 months of all families", () => {
    const f = parseReportFilter({ from: "2025-02-30", to: "2025-01-01", last: "5", family: "Not A Slug!" }, today);
    expect(f.period.preset).toBe(12);
    expect(f.period.fromDay).toBe("2025-05-31");
    expect(f.familySlug).toBeNull();
    expect(parseDay("2025-02-29")).toBeNull();
    expect(parseDay("2024-02-29")?.toISOString()).toBe("2024-02-29T00:00:00.000Z");
  });

  it("a reversed range is not taken", () => {
    expect(parseReportFilter({ from: "2025-06-01", to: "2025-05-01" }, today).period.preset).toBe(12);
  });

  it("months of a period and the query string that reproduces it", () => {
    const f = parseReportFilter({ from: "2025-11-15", to: "2026-02-01" }, today);
    expect(monthsOf(f.period)).toEqual(["2025-11", "2025-12", "2026-01", "2026-02"]);
    expect(filterQuery(f)).toBe("from=2025-11-15&to=2026-02-01");
    expect(filterQuery(f, { preset: 6, familySlug: "haldrin-carrow-1" })).toBe("last=6&family=haldrin-carrow-1");
    expect(filterQuery(parseReportFilter({ last: "24", family: "x-1" }, today), { familySlug: null })).toBe("last=24");
    expect(monthsBefore(new Date("2024-03-31T00:00:00Z"), 1).toISOString().slice(0, 10)).toBe("2024-02-29");
  });
});
