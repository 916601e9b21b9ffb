import { eq, inArray } from "drizzle-orm";
import { readFileSync, readdirSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { db, sql as pg } from "@/db";
import { triageScores } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { rankingRowScore, rankingScores, type RankingScores } from "@/lib/diagnosis";
import { reopenCaseAction, saveOutcomeAction, startBenchAction } from "@/lib/outcomes/actions";
import { treeAccuracy, truthFor } from "@/lib/reports/accuracy";
import { parseReportFilter } from "@/lib/reports/period";
import { resolveScope } from "@/lib/reports/scope";
import { createRoleUsers } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { day, demoIds, insertCases, type CaseSpec, type DemoIds } from "./fixtures";
import { prng } from "@/lib/random";

const F = "orvanta-tessel-2";
const TREES = ["pedal-slip", "weak-assist", "grinding-noise", "water-cutout"];
const SLUGS = ["owc-cage-broken", "belt-worn", "torque-sensor-drift", "speed-sensor-gap", "firmware-outdated", "needle-bearing-water", "crank-seal-worn"];

/** Rankings with ties, zeros, an unlisted share or none, and primaries inside, outside or missing from them. */
function generatedCases(n: number): { spec: CaseSpec; ranking: Record<string, number>; primary: string | null }[] {
  const next = prng(2026);
  return Array.from({ length: n }, (_, i) => {
    const ranking: Record<string, number> = {};
    for (const slug of SLUGS) if (next() < 0.5) ranking[slug] = Math.round(next() * 4) / 4; // quarters: ties and zeros
    if (next() < 0.7) ranking.unlisted = Math.round(next() * 10) / 10;
    const pick = next();
    const primary = pick < 0.15 ? null : SLUGS[Math.floor(next() * SLUGS.length)];
    const closedAt = new Date(day("2025-03-01").getTime() + (i % 200) * 86_400_000);
    return { spec: { family: F, tree: TREES[i % TREES.length], closedAt, primary, ranking }, ranking, primary };
  });
}

function expectSameScores(actual: RankingScores, expected: RankingScores) {
  expect(actual.n).toBe(expected.n);
  expect(actual.top1).toBeCloseTo(expected.top1, 12);
  expect(actual.top3).toBeCloseTo(expected.top3, 12);
  expect(actual.brier).toBeCloseTo(expected.brier, 12);
  expect(actual.logLoss).toBeCloseTo(expected.logLoss, 12);
  expect(actual.calibration.map((b) => b.n)).toEqual(expected.calibration.map((b) => b.n));
  actual.calibration.forEach((b, i) => {
    expect(b.meanPredicted).toBeCloseTo(expected.calibration[i].meanPredicted, 12);
    expect(b.observed).toBeCloseTo(expected.calibration[i].observed, 12);
  });
}

async function storedScores(caseIds: number[]) {
  const rows = await db.select().from(triageScores).where(inArray(triageScores.caseId, caseIds));
  return new Map(rows.map((r) => [r.caseId, r]));
}

/** The stored score of a case equals rankingRowScore of its ranking against its primary cause. */
function expectScoreOf(stored: typeof triageScores.$inferSelect | undefined, ranking: Record<string, number>, primary: string | null) {
  const s = rankingRowScore({ probabilities: ranking, confirmed: truthFor(ranking, primary) });
  expect(stored).toBeDefined();
  expect(stored!.confirmedRank).toBe(Number.isFinite(s.rank) ? s.rank : null);
  expect(stored!.confirmedP).toBeCloseTo(s.confirmedP, 12);
  expect(stored!.topP).toBeCloseTo(s.topP, 12);
  expect(stored!.brier).toBeCloseTo(s.brier, 12);
  expect(stored!.logLoss).toBeCloseTo(s.logLoss, 12);
}

describe("triage scores stored with the bench outcome", () => {
  let ids: DemoIds;
  const cases = generatedCases(600);
  let caseIds: number[];

  beforeAll(async () => {
    await resetToDemo();
    ids = await demoIds();
    caseIds = await insertCases(ids, cases.map((c) => c.spec));
  });

  it("the report from stored scores equals rankingScores over the stored rankings (brute force, 600 cases)", async () => {
    const scope = await resolveScope(parseReportFilter({ from: "2025-01-01", to: "2025-12-31" }));
    const byTree = new Map((await treeAccuracy(scope)).map((a) => [a.treeSlug, a.scores]));
    expect([...byTree.keys()].sort()).toEqual([...TREES].sort());
    for (const tree of TREES) {
      const rows = cases.filter((c) => c.spec.tree === tree).map((c) => ({ probabilities: c.ranking, confirmed: truthFor(c.ranking, c.primary) }));
      expectSameScores(byTree.get(tree)!, rankingScores(rows));
    }
  });

  it("the migration's backfill scores existing cases exactly as the app does", async () => {
    const dir = path.join(process.cwd(), "db", "migrations");
    const file = readdirSync(dir).find((f) => f.endsWith("_triage_scores.sql"))!;
    const backfill = readFileSync(path.join(dir, file), "utf8").split("--> statement-breakpoint").find((s) => s.includes("INSERT INTO"))!;
    const before = await storedScores(caseIds);
    await db.delete(triageScores);
    await pg.unsafe(backfill);
    const after = await storedScores(caseIds);
    expect(after.size).toBe(caseIds.length);
    for (const [i, id] of caseIds.entries()) expectScoreOf(after.get(id), cases[i].ranking, cases[i].primary);
    expect(caseIds.map((id) => after.get(id)!.confirmedRank)).toEqual(caseIds.map((id) => before.get(id)!.confirmedRank));
  });

  describe("through the bench outcome form", () => {
    const ranking = { "owc-cage-broken": 0.6, "belt-worn": 0.3, unlisted: 0.1 };
    let users: Awaited<ReturnType<typeof createRoleUsers>>;
    let caseId: number;
    const form = (primary: string, intent?: "close") => ({
      caseId: String(caseId), labourMinutes: "40", causeId: String(ids.cause(primary)), ...(intent ? { intent } : {}),
    });
    const stored = async () => (await storedScores([caseId])).get(caseId);

    beforeAll(async () => {
      users = await createRoleUsers();
      [caseId] = await insertCases(ids, [{ family: F, tree: "pedal-slip", status: "booked_in", ranking }]);
      expect((await executeAction(startBenchAction, { caseId: String(caseId) }, users.tech)).ok).toBe(true);
    });

    it("an outcome saved on the bench is scored in its transaction", async () => {
      expect(await stored()).toBeUndefined();
      expect((await executeAction(saveOutcomeAction, form("belt-worn"), users.tech)).ok).toBe(true);
      expectScoreOf(await stored(), ranking, "belt-worn");
      expect((await stored())!.confirmedRank).toBe(2);
    });

    it("closing with a different primary cause rewrites the score", async () => {
      expect((await executeAction(saveOutcomeAction, form("owc-cage-broken", "close"), users.tech)).ok).toBe(true);
      expectScoreOf(await stored(), ranking, "owc-cage-broken");
      expect((await stored())!.confirmedRank).toBe(1);
    });

    it("reopened, edited and closed again, the score follows the last outcome", async () => {
      expect((await executeAction(reopenCaseAction, { caseId: String(caseId), reason: "Wrong cause recorded" }, users.senior)).ok).toBe(true);
      // A cause the tree does not list: the unlisted hypothesis was right, third at p = 0.1.
      expect((await executeAction(saveOutcomeAction, form("torque-sensor-drift", "close"), users.tech)).ok).toBe(true);
      expectScoreOf(await stored(), ranking, "torque-sensor-drift");
      expect((await stored())!.confirmedRank).toBe(3);
      const rows = await db.select({ id: triageScores.caseId }).from(triageScores).where(eq(triageScores.caseId, caseId));
      expect(rows).toHaveLength(1);
    });
  });
});
