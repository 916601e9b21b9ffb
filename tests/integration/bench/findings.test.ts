import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { benchFindings, uploads } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { recordFindingAction } from "@/lib/bench/actions";
import { benchProgress } from "@/lib/bench/progress";
import { loadBench } from "@/lib/bench/queries";
import { createRoleUsers } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { demoIds, insertCases, times, type DemoIds } from "../reports/fixtures";

const RANKING = { "owc-cage-broken": 0.5, "crank-arm-loose": 0.2, "needle-bearing-water": 0.15, "crank-bearing-ds-worn": 0.1, unlisted: 0.05 };

describe("bench findings", () => {
  let ids: DemoIds;
  let users: Awaited<ReturnType<typeof createRoleUsers>>;
  let onBench: number;
  let advisedOnBench: number;
  let booked: number;

  beforeAll(async () => {
    await resetToDemo();
    users = await createRoleUsers();
    ids = await demoIds();
    [onBench, advisedOnBench, booked] = await insertCases(ids, [
      { family: "orvanta-tessel-2", tree: "clicking-under-load", status: "on_bench", ranking: RANKING },
      // Triage ended "advised" (no bench plan stored), yet the unit came in after all.
      { family: "orvanta-kestrum-1", tree: "pedal-slip", status: "on_bench", ranking: { "owc-cage-broken": 0.6, "owc-rollers-worn": 0.3, unlisted: 0.1 } },
      { family: "orvanta-tessel-2", tree: "clicking-under-load", status: "booked_in", ranking: RANKING },
    ]);
    // History for the companions: the clutch cage came with a needle bearing in 3 of 5 cases.
    await insertCases(ids, [
      ...times(3, { family: "orvanta-tessel-2", tree: "clicking-under-load", primary: "owc-cage-broken", secondary: ["needle-bearing-water"] }),
      ...times(2, { family: "orvanta-tessel-2", tree: "clicking-under-load", primary: "owc-cage-broken" }),
      ...times(5, { family: "orvanta-tessel-2", tree: "clicking-under-load", primary: "crank-arm-loose" }),
    ]);
  });

  const record = (caseId: number, cause: string, result: string, who = users.tech, extra: Record<string, unknown> = {}) =>
    executeAction(recordFindingAction, { caseId: String(caseId), cause, result, ...extra }, who);

  it("records a finding and replaces it when recorded again", async () => {
    expect((await record(onBench, "crank-arm-loose", "not_done")).ok).toBe(true);
    const again = await record(onBench, "crank-arm-loose", "not_found");
    expect(again.ok).toBe(true);
    const rows = await db.select().from(benchFindings).where(eq(benchFindings.caseId, onBench));
    expect(rows.map((r) => [r.causeId, r.result])).toEqual([[ids.cause("crank-arm-loose"), "not_found"]]);
  });

  it("trainees and shop leads cannot record findings", async () => {
    for (const who of [users.trainee, users.lead]) {
      const result = await record(onBench, "owc-cage-broken", "found", who);
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.status).toBe(403);
    }
  });

  it("refuses bad input and leaves the findings as they were", async () => {
    const before = await db.select().from(benchFindings).where(eq(benchFindings.caseId, onBench));
    const notOnBench = await record(booked, "owc-cage-broken", "found");
    expect(notOnBench.ok ? 0 : notOnBench.status).toBe(409);
    const unknownCause = await record(onBench, "no-such-cause", "found");
    expect(unknownCause.ok ? 0 : unknownCause.status).toBe(422);
    const badResult = await record(onBench, "owc-cage-broken", "maybe");
    expect(badResult.ok ? 0 : badResult.status).toBe(400);
    // A photo uploaded to another case is not this finding's photo.
    const photoId = "a".repeat(32);
    await db.insert(uploads).values({ id: photoId, storageKey: "x", originalName: "x.jpg", mime: "image/jpeg", bytes: 1, caseId: booked });
    const foreignPhoto = await record(onBench, "owc-cage-broken", "found", users.tech, { photoId });
    expect(foreignPhoto.ok ? 0 : foreignPhoto.status).toBe(422);
    expect(await db.select().from(benchFindings).where(eq(benchFindings.caseId, onBench))).toEqual(before);
  });

  it("keeps a photo of the case with the finding", async () => {
    const photoId = "b".repeat(32);
    await db.insert(uploads).values({ id: photoId, storageKey: "y", originalName: "cage.jpg", mime: "image/jpeg", bytes: 1, caseId: onBench });
    expect((await record(onBench, "owc-cage-broken", "found", users.tech, { photoId })).ok).toBe(true);
    const [row] = await db.select().from(benchFindings)
      .where(and(eq(benchFindings.caseId, onBench), eq(benchFindings.causeId, ids.cause("owc-cage-broken"))));
    expect(row.photoId).toBe(photoId);
  });

  it("two findings saved at once on one case both land", async () => {
    const results = await Promise.all([
      record(onBench, "crank-bearing-ds-worn", "not_found"),
      record(onBench, "needle-bearing-water", "not_done"),
    ]);
    expect(results.every((r) => r.ok)).toBe(true);
    expect(await db.select().from(benchFindings).where(eq(benchFindings.caseId, onBench))).toHaveLength(4);
  });

  it("works out the plan, the companions and the proposal from the stored findings", async () => {
    await db.delete(benchFindings).where(eq(benchFindings.caseId, onBench));
    await record(onBench, "owc-cage-broken", "found");
    const data = (await loadBench(onBench))!;
    const progress = benchProgress(data.inputs);
    expect(progress.found).toEqual(["owc-cage-broken"]);
    expect(progress.openStages).toEqual(["unit", "outer-shell", "crank-axle", "clutch-pack"]);
    // The needle bearing sits in the open crank stage and came with the clutch cage in 3 of its 5 cases.
    expect(progress.companions.map((c) => c.cause)).toContain("needle-bearing-water");
    expect(progress.checklist.every((s) => s.opens.every((o) => !progress.openStages.includes(o.slug)))).toBe(true);
    expect(progress.proposedParts.length).toBeGreaterThan(0);
  });

  it("a unit on the bench whose call ended advised still gets a plan", async () => {
    const data = (await loadBench(advisedOnBench))!;
    const progress = benchProgress(data.inputs);
    expect(progress.checklist.map((s) => s.cause).sort()).toEqual(["owc-cage-broken", "owc-rollers-worn"]);
    expect(progress.expectedMinutesLeft).toBeGreaterThan(0);
  });
});
