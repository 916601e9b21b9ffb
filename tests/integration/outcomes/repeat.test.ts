import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { cases } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { saveOutcomeAction } from "@/lib/outcomes/actions";
import { repeatLinksOf } from "@/lib/outcomes/repeat";
import { createRoleUsers } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { day, demoIds, insertCases } from "../reports/fixtures";

describe("repeat returns: same serial, same family, within 90 days", () => {
  let first: number;
  let back: number;
  let otherFamily: number;
  let muchLater: number;

  beforeAll(async () => {
    await resetToDemo();
    const users = await createRoleUsers();
    const ids = await demoIds();
    const serial = "OT2-TEST-0042";
    [first, back, otherFamily, muchLater] = await insertCases(ids, [
      { family: "orvanta-tessel-2", tree: "pedal-slip", serial, createdAt: day("2025-01-10"), closedAt: day("2025-01-20"), primary: "owc-cage-broken" },
      { family: "orvanta-tessel-2", tree: "pedal-slip", serial, createdAt: day("2025-03-01"), status: "on_bench" },
      { family: "haldrin-carrow-1", tree: "pedal-slip", serial, createdAt: day("2025-03-05"), status: "on_bench" },
      { family: "orvanta-tessel-2", tree: "pedal-slip", serial, createdAt: day("2025-07-15"), status: "on_bench" },
    ]);
    for (const id of [back, otherFamily, muchLater]) {
      const saved = await executeAction(saveOutcomeAction, { caseId: String(id), causeId: String(ids.cause("belt-worn")) }, users.tech);
      expect(saved.ok).toBe(true);
    }
  });

  it("saving the outcome of the unit that came back links it to the earlier case", async () => {
    const rows = await db.select({ id: cases.id, repeatOf: cases.repeatOfCaseId }).from(cases);
    const repeatOf = new Map(rows.map((r) => [r.id, r.repeatOf]));
    expect(repeatOf.get(back)).toBe(first);
    // Another family's unit with the same serial is another unit; 136 days after the last visit is outside the window.
    expect(repeatOf.get(otherFamily)).toBeNull();
    expect(repeatOf.get(muchLater)).toBeNull();
  });

  it("both case pages see the link, in their own direction", async () => {
    const fromFirst = await repeatLinksOf(first);
    expect(fromFirst.map((l) => [l.id, l.direction, l.days])).toEqual([[back, "later", 50]]);
    const fromBack = await repeatLinksOf(back);
    expect(fromBack.map((l) => [l.id, l.direction, l.days])).toEqual([[first, "earlier", -50]]);
    expect(await repeatLinksOf(otherFamily)).toEqual([]);
    const [row] = await db.select({ serial: cases.serial }).from(cases).where(eq(cases.id, muchLater));
    expect(row.serial).toBe("OT2-TEST-0042");
  });
});
