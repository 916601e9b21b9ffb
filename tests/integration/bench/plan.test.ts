import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { cases } from "@/db/schema";
import { teardownSummary } from "@/lib/bench/plan";
import { benchProgress } from "@/lib/bench/progress";
import { loadBench } from "@/lib/bench/queries";
import { resetToDemo } from "../../support/seed";
import { demoIds, insertCases } from "../reports/fixtures";

const RANKING = { "owc-cage-broken": 0.6, "owc-rollers-worn": 0.3, unlisted: 0.1 };

// The case page and the job card print the bench plan from teardownSummary; the bench screen works
// from benchProgress over loadBench. They must be the same plan.
describe("the bench plan printed for a unit in the shop", () => {
  let booked: number;
  let onBench: number;
  let advised: number;
  let closed: number;

  beforeAll(async () => {
    await resetToDemo();
    const ids = await demoIds();
    [booked, onBench, advised, closed] = await insertCases(ids, [
      // Neither stores a bench plan from the call (as a call that ended "advised" before the unit came in).
      { family: "orvanta-kestrum-1", tree: "pedal-slip", status: "booked_in", ranking: RANKING },
      { family: "orvanta-tessel-2", tree: "clicking-under-load", status: "on_bench", ranking: RANKING },
      { family: "orvanta-kestrum-1", tree: "pedal-slip", status: "advised", ranking: RANKING },
      { family: "orvanta-kestrum-1", tree: "pedal-slip", status: "closed", ranking: RANKING, primary: "owc-cage-broken" },
    ]);
  });

  it("is the bench screen's checklist and expected minutes, though the call stored no plan", async () => {
    for (const id of [booked, onBench]) {
      const [kase] = await db.select({ id: cases.id, status: cases.status, benchPlan: cases.benchPlan }).from(cases).where(eq(cases.id, id));
      expect(kase.benchPlan).toBeNull();
      const progress = benchProgress((await loadBench(id))!.inputs);
      const summary = await teardownSummary(kase);
      expect(summary).toEqual({ order: progress.checklist.map((s) => s.cause), expectedMinutes: progress.expectedMinutesLeft, href: `/cases/${id}/bench` });
      expect(summary!.order.slice().sort()).toEqual(["owc-cage-broken", "owc-rollers-worn"]);
      expect(summary!.expectedMinutes).toBeGreaterThan(0);
    }
  });

  it("is none for a case with no unit in the shop (advised by phone, or closed), which keeps the plan of its call", async () => {
    expect(await teardownSummary({ id: advised, status: "advised" })).toBeNull();
    expect(await teardownSummary({ id: closed, status: "closed" })).toBeNull();
  });
});
