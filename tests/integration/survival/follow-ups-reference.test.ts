import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, sql as pg } from "@/db";
import { causes, outcomeUpgrades, type CaseStatus, type UpgradeKind } from "@/db/schema";
import { storeOutcomeCopies } from "@/lib/outcomes/outcome-copies";
import { followUps, type FollowUpCount, type FollowUpScope } from "@/lib/survival/follow-ups";
import { groupOfArea } from "@/lib/survival/groups";
import { UPGRADES } from "@/lib/survival/upgrades";
import { resetToDemo } from "../../support/seed";
import { day, demoIds, insertCases, type CaseSpec } from "../reports/fixtures";
import { prng } from "@/lib/random";

const DAY_MS = 86_400_000;
const F = "orvanta-tessel-2";
const SLUGS = ["owc-cage-broken", "owc-rollers-worn", "crank-seal-worn", "needle-bearing-water", "belt-worn", "torque-sensor-drift", "firmware-outdated", "housing-cracked"];
const STATUSES: CaseStatus[] = ["closed", "closed", "closed", "closed", "on_bench", "booked_in", "advised"];

/** Units back often, for the same or another fault, with bookings that overlap, no outcome yet, or no serial. */
function generatedHistory(n: number, next: () => number): { spec: CaseSpec; upgrades: UpgradeKind[] }[] {
  const pick = <T,>(list: readonly T[]) => list[Math.floor(next() * list.length)];
  return Array.from({ length: n }, () => {
    const status = pick(STATUSES);
    const createdAt = new Date(day("2025-01-01").getTime() + Math.floor(next() * 500) * DAY_MS + Math.floor(next() * 20) * 3_600_000);
    const closedAt = status === "closed" ? new Date(createdAt.getTime() + Math.floor(next() * 30 * 24) * 3_600_000) : null;
    const outcome = next();
    const primary = outcome < 0.1 ? undefined : outcome < 0.2 ? null : pick(SLUGS);
    const secondary = primary !== undefined && next() < 0.3 ? [pick(SLUGS)].filter((s) => s !== primary) : [];
    const upgrades = primary === undefined ? [] : UPGRADES.filter(() => next() < 0.25).map((u) => u.slug);
    const serial = next() < 0.05 ? "" : `G${Math.floor(next() * 60)}`;
    return { spec: { family: F, tree: "pedal-slip", serial, status, createdAt, closedAt, primary, secondary }, upgrades };
  });
}

/** The documented rule (lib/survival/follow-ups.ts), worked out in TypeScript from the outcome tables themselves. */
async function reference(scope: FollowUpScope): Promise<FollowUpCount[]> {
  const visits = (await pg<{ id: number; familyId: number; serial: string; createdAt: string; status: string; closedAt: string | null; ridingUse: string }[]>`
    select id, family_id as "familyId", serial, created_at as "createdAt", status, closed_at as "closedAt", riding_use as "ridingUse"
    from cases where serial <> '' order by family_id, serial, created_at, id`)
    .map((r) => ({ ...r, createdAt: new Date(r.createdAt), closedAt: r.closedAt === null ? null : new Date(r.closedAt) }));
  const groupOf = new Map((await db.select({ id: causes.id, area: causes.area }).from(causes)).map((c) => [c.id, groupOfArea(c.area)]));
  const confirmed = new Map<number, { primary: number | null; all: number[] }>();
  for (const r of await pg<{ caseId: number; causeId: number; primary: boolean }[]>`select case_id as "caseId", cause_id as "causeId", is_primary as primary from outcome_causes`) {
    const c = confirmed.get(r.caseId) ?? { primary: null, all: [] };
    if (r.primary) c.primary = r.causeId;
    c.all.push(r.causeId);
    confirmed.set(r.caseId, c);
  }
  const fitted = new Map<number, string[]>();
  for (const u of await db.select().from(outcomeUpgrades)) fitted.set(u.caseId, [...(fitted.get(u.caseId) ?? []), u.upgrade]);

  const counts = new Map<string, FollowUpCount>();
  const add = (kind: "group" | "fitted", key: string, days: number, event: boolean) => {
    const k = `${kind}|${key}|${days}|${event}`;
    const row = counts.get(k) ?? { kind, key, days, event, n: 0 };
    row.n++;
    counts.set(k, row);
  };
  visits.forEach((r, i) => {
    const primary = confirmed.get(r.id)?.primary ?? null;
    if (r.status !== "closed" || primary === null || !r.closedAt) return;
    if (scope.familyId !== null && r.familyId !== scope.familyId) return;
    if (scope.ridingUse !== null && r.ridingUse !== scope.ridingUse) return;
    if (r.closedAt < scope.from || r.closedAt >= scope.to) return;
    const group = groupOf.get(primary)!;
    const after = visits[i + 1];
    const next = after && after.familyId === r.familyId && after.serial === r.serial ? after : null;
    const end = next ? Math.max(next.createdAt.getTime(), r.closedAt.getTime()) : scope.asOf.getTime();
    const days = Math.floor((end - r.closedAt.getTime()) / DAY_MS);
    const event = next !== null && next.createdAt > r.closedAt && (confirmed.get(next.id)?.all ?? []).some((c) => groupOf.get(c) === group);
    add("group", group, days, event);
    for (const u of fitted.get(r.id) ?? []) if (UPGRADES.find((x) => x.slug === u)!.guards === group) add("fitted", u, days, event);
  });
  return [...counts.values()];
}

const sorted = (rows: FollowUpCount[]) => [...rows].sort((a, b) => a.kind.localeCompare(b.kind) || a.key.localeCompare(b.key) || a.days - b.days || Number(a.event) - Number(b.event));

describe("return-free follow-up against the rule worked out from the outcome tables", () => {
  let family: number;

  beforeAll(async () => {
    await resetToDemo();
    const ids = await demoIds();
    family = ids.family(F);
    const history = generatedHistory(700, prng(2026));
    const caseIds = await insertCases(ids, history.map((h) => h.spec));
    const upgradeRows = history.flatMap((h, i) => h.upgrades.map((upgrade) => ({ caseId: caseIds[i], upgrade })));
    await db.transaction(async (tx) => {
      await tx.insert(outcomeUpgrades).values(upgradeRows);
      await storeOutcomeCopies(tx, caseIds);
    });
  });

  const scopes = (): [string, FollowUpScope][] => [
    ["one family, all time", { from: day("2024-01-01"), to: day("2027-01-01"), familyId: family, ridingUse: null, asOf: day("2026-09-01") }],
    ["all families, part of a year", { from: day("2025-03-01"), to: day("2025-11-01"), familyId: null, ridingUse: null, asOf: day("2026-09-01") }],
    ["one riding use", { from: day("2024-01-01"), to: day("2027-01-01"), familyId: family, ridingUse: "road", asOf: day("2026-09-01") }],
  ];

  it("counts the same follow-ups, events and upgrades fitted in every scope", async () => {
    for (const [name, scope] of scopes()) {
      const expected = sorted(await reference(scope));
      expect(expected.some((r) => r.kind === "fitted"), name).toBe(true);
      expect(expected.some((r) => r.event), name).toBe(true);
      expect(sorted(await followUps(scope)), name).toEqual(expected);
    }
  });

  it("follows a catalogue edit at once: a cause moved to another area changes its group", async () => {
    const [cause] = await db.select().from(causes).where(eq(causes.slug, "belt-worn"));
    const [scopeName, scope] = scopes()[0];
    const before = sorted(await followUps(scope));
    await db.update(causes).set({ area: "clutch" }).where(eq(causes.id, cause.id));
    try {
      const after = sorted(await followUps(scope));
      expect(after, scopeName).not.toEqual(before);
      expect(after, scopeName).toEqual(sorted(await reference(scope)));
    } finally {
      await db.update(causes).set({ area: cause.area }).where(eq(causes.id, cause.id));
    }
  });
});
