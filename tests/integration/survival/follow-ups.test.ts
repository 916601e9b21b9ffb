import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { cases, outcomeUpgrades, type UpgradeKind } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { listCases } from "@/lib/cases/list";
import { caseListQuery } from "@/lib/cases/list-query";
import { kaplanMeierOfTally, logRank } from "@/lib/diagnosis";
import { reopenCaseAction, saveOutcomeAction, startBenchAction } from "@/lib/outcomes/actions";
import { storeOutcomeCopies } from "@/lib/outcomes/outcome-copies";
import { upgradeAdviceFor } from "@/lib/survival/advice-query";
import { compareUpgrades, talliesByKey, tallyOf } from "@/lib/survival/compare";
import { followUps, type FollowUpCount } from "@/lib/survival/follow-ups";
import { saveWarrantyAction } from "@/lib/survival/actions";
import { loadWarrantyMonths, warrantyReturnOf } from "@/lib/survival/warranty";
import { createRoleUsers } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { day, demoIds, insertCases, type DemoIds } from "../reports/fixtures";

const AS_OF = new Date("2026-06-30T00:00:00Z");
const scope = (familyId: number) => ({ from: new Date("2025-01-01T00:00:00Z"), to: AS_OF, familyId, ridingUse: null, asOf: AS_OF });
// Written as every writer of an outcome does: the upgrade row, then the case row's copy of it.
const fit = (caseId: number, upgrade: UpgradeKind) => db.transaction(async (tx) => {
  await tx.insert(outcomeUpgrades).values({ caseId, upgrade });
  await storeOutcomeCopies(tx, [caseId]);
});
const sorted = (rows: FollowUpCount[]) => [...rows].sort((a, b) => a.kind.localeCompare(b.kind) || a.key.localeCompare(b.key) || a.days - b.days);

describe("return-free follow-up on a small hand-made history", () => {
  let ids: DemoIds;
  let family: number;
  const ref: Record<string, number> = {};

  beforeAll(async () => {
    await resetToDemo();
    ids = await demoIds();
    family = ids.family("orvanta-tessel-2");
    const t = { family: "orvanta-tessel-2", tree: "pedal-slip" };
    const [a, a2, a3, b, c, c2, h, g, noSerial] = await insertCases(ids, [
      // S1 comes back twice: first for the same kind of fault (clutch after clutch), then for an unrelated one.
      { ...t, serial: "S1", closedAt: day("2026-01-01"), primary: "owc-cage-broken" },
      { ...t, serial: "S1", createdAt: day("2026-03-02"), closedAt: day("2026-03-10"), primary: "owc-rollers-worn" },
      { ...t, serial: "S1", createdAt: day("2026-04-09"), closedAt: day("2026-04-20"), primary: "crank-seal-worn" },
      // S2 never comes back.
      { ...t, serial: "S2", closedAt: day("2026-02-01"), primary: "owc-cage-broken" },
      // S3 is back but nothing is confirmed yet.
      { ...t, serial: "S3", closedAt: day("2026-02-15"), primary: "owc-cage-broken" },
      { ...t, serial: "S3", status: "booked_in", createdAt: day("2026-02-25") },
      // S6 got a second booking while the first was still on the bench: not a return.
      { ...t, serial: "S6", createdAt: day("2026-01-10"), closedAt: day("2026-01-20"), primary: "owc-cage-broken" },
      { ...t, serial: "S6", status: "advised", createdAt: day("2026-01-15") },
      // Without a serial a unit cannot be followed.
      { ...t, serial: "", closedAt: day("2026-01-05"), primary: "owc-cage-broken" },
    ]);
    Object.assign(ref, { a, a2, a3, b, c, c2, h, g, noSerial });
    await fit(a, "uprated-clutch");
  });

  it("ends each follow-up by the documented rule", async () => {
    const rows = sorted(await followUps(scope(family)));
    // Hand-computed whole days from closing (noon) to the next visit (noon) or to 30 June 00:00.
    expect(rows).toEqual([
      { kind: "fitted", key: "uprated-clutch", days: 60, event: true, n: 1 }, // S1's first repair had the uprated clutch
      { kind: "group", key: "clutch", days: 0, event: false, n: 1 }, // S6: second booking while on the bench
      { kind: "group", key: "clutch", days: 10, event: false, n: 1 }, // S3: back, nothing confirmed yet
      { kind: "group", key: "clutch", days: 30, event: false, n: 1 }, // S1's second repair: back for a seal fault
      { kind: "group", key: "clutch", days: 60, event: true, n: 1 }, // S1's first repair: clutch again
      { kind: "group", key: "clutch", days: 148, event: false, n: 1 }, // S2: not back by 30 June
      { kind: "group", key: "sealing", days: 70, event: false, n: 1 }, // S1's third repair: not back
    ]);
    // Kaplan–Meier by hand: one event at 60 days with 2 at risk (60 and 148) → S = 1/2.
    const steps = kaplanMeierOfTally(tallyOf(rows.filter((r) => r.kind === "group" && r.key === "clutch")));
    expect(steps).toHaveLength(1);
    expect(steps[0]).toMatchObject({ time: 60, atRisk: 2, events: 1, censored: 1, survival: 0.5 });
  });

  it("flags warranty returns on the case and in the cases table", async () => {
    expect(await warrantyReturnOf(ref.a2)).toMatchObject({ repairId: ref.a, days: 60, months: 6 });
    expect(await warrantyReturnOf(ref.a3)).toMatchObject({ repairId: ref.a2, days: 30 });
    expect(await warrantyReturnOf(ref.c2)).toMatchObject({ repairId: ref.c, days: 10 });
    expect(await warrantyReturnOf(ref.g)).toBeNull(); // opened before the other booking was closed
    expect(await warrantyReturnOf(ref.a)).toBeNull();
    const page = await listCases(caseListQuery.parse({ q: "S1", limit: "50" }));
    const flags = Object.fromEntries(page.rows.map((r) => [r.id, r.warrantyOf]));
    const reference = async (id: number) => (await db.select({ r: cases.reference }).from(cases).where(eq(cases.id, id)))[0].r;
    expect(flags).toEqual({ [ref.a]: null, [ref.a2]: await reference(ref.a), [ref.a3]: await reference(ref.a2) });
  });

  it("makes no claim from a history this small", async () => {
    const advice = await upgradeAdviceFor({ id: family, name: "Tessel Gen 2" }, "road", AS_OF);
    expect(advice.items.every((a) => a.kind === "too_few" && a.callerText === null)).toBe(true);
  });

  it("follows a reopened repair from its last closing only", async () => {
    const users = await createRoleUsers();
    const [e] = await insertCases(ids, [{ family: "orvanta-tessel-2", tree: "pedal-slip", serial: "S5", status: "booked_in" }]);
    await executeAction(startBenchAction, { caseId: String(e) }, users.tech);
    const close = () => executeAction(saveOutcomeAction, { caseId: String(e), intent: "close", causeId: String(ids.cause("owc-cage-broken")), primaryCause: String(ids.cause("owc-cage-broken")), upgradeKind: "uprated-clutch" }, users.tech);
    expect((await close()).ok).toBe(true);
    expect((await executeAction(reopenCaseAction, { caseId: String(e), reason: "Clutch re-check after road test" }, users.senior)).ok).toBe(true);
    const now = { ...scope(family), to: new Date(Date.now() + 60_000), asOf: new Date(Date.now() + 60_000) };
    const reopened = await followUps(now);
    expect(reopened.filter((r) => r.key === "uprated-clutch" && r.days === 0)).toEqual([]); // on the bench again: not followed
    expect((await close()).ok).toBe(true);
    const [row] = await db.select({ closedAt: cases.closedAt }).from(cases).where(eq(cases.id, e));
    const again = await followUps({ ...now, from: new Date(row.closedAt!.getTime() - 1000) });
    expect(sorted(again)).toEqual([
      { kind: "fitted", key: "uprated-clutch", days: 0, event: false, n: 1 },
      { kind: "group", key: "clutch", days: 0, event: false, n: 1 },
    ]);
  });
});

describe("upgrades on the bench form", () => {
  it("refuses an upgrade that is not on the list and leaves the outcome as it was", async () => {
    await resetToDemo();
    const ids = await demoIds();
    const users = await createRoleUsers();
    const [id] = await insertCases(ids, [{ family: "orvanta-tessel-2", tree: "pedal-slip", serial: "S9", status: "on_bench" }]);
    const result = await executeAction(saveOutcomeAction, { caseId: String(id), upgradeKind: ["uprated-clutch", "turbo-kit"] }, users.tech);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.fieldErrors?.upgradeKind).toBe("Pick upgrades from the list.");
    expect(await db.select().from(outcomeUpgrades).where(eq(outcomeUpgrades.caseId, id))).toEqual([]);
    const saved = await executeAction(saveOutcomeAction, { caseId: String(id), upgradeKind: ["uprated-clutch", "uprated-clutch", "cable-sleeve"] }, users.tech);
    expect(saved.ok).toBe(true);
    const rows = await db.select({ upgrade: outcomeUpgrades.upgrade }).from(outcomeUpgrades).where(eq(outcomeUpgrades.caseId, id));
    expect(rows.map((r) => r.upgrade).sort()).toEqual(["cable-sleeve", "uprated-clutch"]);
  });
});

describe("upgrade advice where the record bears it", () => {
  it("supports an upgrade with fewer returns and says nothing of one it cannot judge", async () => {
    await resetToDemo();
    const ids = await demoIds();
    const family = ids.family("pellacor-fennel-1");
    const t = { family: "pellacor-fennel-1", tree: "water-cutout" };
    const repair = (serial: string) => ({ ...t, serial, closedAt: day("2026-01-01"), primary: "crank-seal-worn" });
    // 30 repairs with the seal and grease barrier, one back for a seal fault after 40 days; 30 without, 15 back.
    const withIds = await insertCases(ids, Array.from({ length: 30 }, (_, i) => repair(`W${i}`)));
    await insertCases(ids, Array.from({ length: 30 }, (_, i) => repair(`N${i}`)));
    for (const id of withIds) await fit(id, "crank-seal-barrier");
    const back = (serial: string) => ({ ...t, serial, status: "on_bench" as const, createdAt: day("2026-02-10"), primary: "housing-gasket-failed" });
    await insertCases(ids, [back("W0"), ...Array.from({ length: 15 }, (_, i) => back(`N${i}`))]);

    const rows = await followUps(scope(family));
    const barrier = compareUpgrades(talliesByKey(rows)).find((c) => c.upgrade.slug === "crank-seal-barrier")!;
    expect(barrier.fitted).toMatchObject({ n: 30, returns: 1 });
    expect(barrier.notFitted).toMatchObject({ n: 30, returns: 15 });
    // The same observations through the engine directly: 1 of 30 vs 15 of 30 back at day 40.
    const obs = (returns: number) => [...Array(returns).fill({ time: 40, event: true }), ...Array(30 - returns).fill({ time: 179, event: false })];
    expect(barrier.pValue).toBeCloseTo(logRank(obs(1), obs(15)).pValue, 12);
    expect(barrier.verdict).toMatchObject({ kind: "better", months: 3 }); // six months not yet reached by 10 units
    expect(barrier.fitted.checkpoints[0].survival).toBeCloseTo(29 / 30, 12); // product-limit by hand
    expect(barrier.notFitted.checkpoints[0].survival).toBeCloseTo(15 / 30, 12);

    const advice = await upgradeAdviceFor({ id: family, name: "Fennel Gen 1" }, "road", AS_OF);
    const byKind = (slug: string) => advice.items.find((a) => a.upgrade.slug === slug)!;
    expect(byKind("crank-seal-barrier")).toMatchObject({ kind: "supported" });
    expect(byKind("crank-seal-barrier").callerText).toContain("3\u00a0% against 50\u00a0% within 3 months (30 and 30 repairs)");
    expect(byKind("sealed-bearings").kind).toBe("too_few"); // never fitted: nothing to compare
    expect(byKind("sealed-screws").kind).toBe("too_few");
  });
});

describe("the warranty period setting", () => {
  it("is six months until the administrator changes it; bad input leaves it as it was", async () => {
    await resetToDemo();
    const users = await createRoleUsers();
    expect(await loadWarrantyMonths()).toBe(6);
    const bad = await executeAction(saveWarrantyAction, { months: "0" }, users.admin);
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.fieldErrors?.months).toBe("At least one month.");
    expect(await loadWarrantyMonths()).toBe(6);
    expect((await executeAction(saveWarrantyAction, { months: "12" }, users.admin)).ok).toBe(true);
    expect(await loadWarrantyMonths()).toBe(12);
  });
});
