import { describe, expect, it } from "vitest";
import { formatReference } from "@/lib/cases/reference";
import { shopCode } from "@/lib/cases/shop";

describe("case references", () => {
  it("are shop letters, two-digit year and month (UTC), and a four-digit sequence", () => {
    expect(formatReference("WD", new Date("2026-11-03T08:00:00Z"), 42)).toBe("WD-2611-0042");
    expect(formatReference("WD", new Date("2027-01-31T23:59:59Z"), 12345)).toBe("WD-2701-12345");
  });

  it("take the shop's letters from the first two words of its name", () => {
    expect(shopCode("Wendside Drive Clinic")).toBe("WD");
    expect(shopCode("fenwick & daughters")).toBe("FD");
    expect(shopCode("Solo")).toBe("SO");
  });
});
