import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { causes } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import type { SessionUser } from "@/lib/auth/session-user";
import { saveCauseAction } from "@/lib/catalogue/actions";
import { causeBySlug } from "@/lib/catalogue/queries";
import { countRows, createUser } from "../../support/db";
import { resetToDemo } from "../../support/seed";

const form = (fields: Record<string, string | string[]>) => {
  const data = new FormData();
  for (const [k, v] of Object.entries(fields)) for (const x of Array.isArray(v) ? v : [v]) data.append(k, x);
  return data;
};

const base = {
  slug: "brake-sensor-stuck", name: "Brake cut-off sensor stuck", area: "sensor", description: "The brake lever sensor reports braking all the time.",
  inspectMinutes: "10", labourMinutes: "25", priceLow: "45", priceHigh: "80,50", ratingNm: "", active: "on",
};

describe("the cause catalogue", () => {
  let senior: SessionUser;
  beforeAll(async () => {
    await resetToDemo();
    senior = await createUser("senior");
  });

  it("creates a cause with its parts; euros become cents", async () => {
    const result = await executeAction(saveCauseAction, form({ ...base, partSlug: ["gear-grease", "housing-gasket"], partQty: ["2", "1"] }), senior);
    expect(result.ok, JSON.stringify(result)).toBe(true);
    const cause = await causeBySlug("brake-sensor-stuck");
    expect(cause).toMatchObject({ area: "sensor", inspectMinutes: 10, labourMinutes: 25, priceLowCents: 4500, priceHighCents: 8050, ratingNm: null, active: true });
    expect(cause?.parts.map((p) => [p.slug, p.quantity]).sort()).toEqual([["gear-grease", 2], ["housing-gasket", 1]]);
  });

  it("gives a message per field and writes nothing when the form is wrong", async () => {
    const before = await countRows("causes");
    const result = await executeAction(saveCauseAction, form({ ...base, slug: "Bad Slug", name: "", inspectMinutes: "0", priceLow: "twelve", priceHigh: "10", ratingNm: "-4" }), senior);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.status).toBe(400);
      expect(result.fieldErrors).toEqual({
        slug: "lower-case words joined by hyphens",
        name: "Name the cause.",
        inspectMinutes: "The inspection time must be at least 1 minute.",
        priceLow: "Enter the lower price in euros, like 160 or 160.50.",
        ratingNm: "A rating is above 0.",
      });
    }
    const upside = await executeAction(saveCauseAction, form({ ...base, slug: "upside-down", priceLow: "90", priceHigh: "10" }), senior);
    expect(!upside.ok && upside.fieldErrors).toEqual({ priceHigh: "The upper price must not be below the lower one." });
    expect(await countRows("causes")).toBe(before);
  });

  it("refuses a slug that is taken, and a part listed twice", async () => {
    const taken = await executeAction(saveCauseAction, form({ ...base, slug: "owc-cage-broken" }), senior);
    expect(!taken.ok && [taken.status, taken.fieldErrors?.slug]).toEqual([409, "Already in use."]);
    const twice = await executeAction(saveCauseAction, form({ ...base, slug: "twice", partSlug: ["gear-grease", "gear-grease"], partQty: ["1", "1"] }), senior);
    expect(!twice.ok && twice.fieldErrors?.parts).toBe("Each part may be listed once; add to its quantity instead.");
  });

  it("edits a cause and replaces its part list; the slug cannot change", async () => {
    const edited = await executeAction(saveCauseAction, form({ ...base, originalSlug: "brake-sensor-stuck", name: "Brake sensor stuck on", partSlug: "housing-gasket", partQty: "3" }), senior);
    expect(edited.ok, JSON.stringify(edited)).toBe(true);
    const cause = await causeBySlug("brake-sensor-stuck");
    expect([cause?.name, cause?.parts.map((p) => [p.slug, p.quantity])]).toEqual(["Brake sensor stuck on", [["housing-gasket", 3]]]);
    const renamed = await executeAction(saveCauseAction, form({ ...base, originalSlug: "brake-sensor-stuck", slug: "other-slug" }), senior);
    expect(!renamed.ok && renamed.status).toBe(422);
    const retired = await executeAction(saveCauseAction, form({ ...base, originalSlug: "brake-sensor-stuck", active: "" }), senior);
    expect(retired.ok).toBe(true);
    expect((await db.select({ active: causes.active }).from(causes).where(eq(causes.slug, "brake-sensor-stuck")))[0].active).toBe(false);
  });
});
