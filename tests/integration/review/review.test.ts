import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { settings, trees, treeVersions } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { acceptSuggestionAction, setLikelihoodModeAction } from "@/lib/review/actions";
import { DIAGNOSIS_SETTINGS_KEY } from "@/lib/triage/dx-settings";
import { learnLikelihoods } from "@/lib/diagnosis";
import { closedCasesOf } from "@/lib/review/closed-cases";
import { ENOUGH_HISTORY } from "@/lib/review/in-use";
import { storedLikelihoods } from "@/lib/review/learned";
import { reviewVersion } from "@/lib/review/review";
import { treeReview } from "@/lib/review/queries";
import { loadGraph, toDxTree } from "@/lib/trees/graph";
import { createRoleUsers } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { day, demoIds, insertCases, times, type DemoIds } from "../reports/fixtures";

// On "clicking-under-load", the answer "over bumps" is authored *against* loose mounting bolts.
// The shop's 30 closed cases of loose bolts all clicked over bumps (each first answered "don't know",
// then changed its answer: the last answer at a node is the one that counts).
const TREE = "clicking-under-load";
const OPTION = "o-when-bumps";
const CAUSE = "mount-bolts-loose";
const bolts = { family: "orvanta-tessel-2", tree: TREE, closedAt: day("2025-04-01"), primary: CAUSE, answers: ["o-when-dk", OPTION] };

describe("evidence review from closed cases", () => {
  let ids: DemoIds;
  let users: Awaited<ReturnType<typeof createRoleUsers>>;
  let versionId: number;
  let treeId: number;

  beforeAll(async () => {
    await resetToDemo();
    users = await createRoleUsers();
    ids = await demoIds();
    versionId = ids.version(TREE).id;
    [{ treeId }] = await db.select({ treeId: treeVersions.treeId }).from(treeVersions).where(eq(treeVersions.id, versionId));
    await insertCases(ids, [
      ...times(30, bolts),
      // Not learned from: an open case, and a record without steps.
      { ...bolts, status: "on_bench", closedAt: null, answers: ["o-when-load"] },
      { ...bolts, steps: false },
    ]);
  });

  it("tests the column against the tree, learns from it and proposes a change", async () => {
    const review = await reviewVersion(versionId);
    expect(review.cases).toBe(30);
    const s = review.suggestions.find((x) => x.nodeKey === "q-when" && x.causeSlug === CAUSE)!;
    // Hand computation of the engine's normalisation: authored P(bumps | bolts) = (1/3) / (1 + 1 + 1/3 + 1) = 0.1
    // (under load, always, over bumps, backwards; don't-know left out).
    expect(s.rows.map((r) => [r.optionKey, r.count])).toEqual([["o-when-load", 0], ["o-when-always", 0], [OPTION, 30], ["o-when-backpedal", 0]]);
    expect(s.rows.map((r) => r.authored)).toEqual([0.3, 0.3, 0.1, 0.3].map((x) => expect.closeTo(x, 12)));
    // Bayes factor of a uniform Dirichlet against the tree: the Bayes–Laplace marginal of a sequence,
    // (m−1)!·Π n_o! / (N+m−1)! = 3!·30!/33!, over the multinomial 0.1³⁰ (hand computation).
    expect(s.logBayesFactor).toBeCloseTo(Math.log(6 / (31 * 32 * 33)) + 30 * Math.log(10), 9);
    // All 30 cases on one answer: the strength chosen from the data is tiny and the learned value follows the counts.
    expect(s.rows[2].learned).toBeGreaterThan(0.99);
    expect(s.cases).toBe(30);
    expect(s.optionKey).toBe(OPTION);
    expect(s.currentStrength).toBe("against");
    // Hand computation: strong gives 9 / (9 + 3) = 0.75, the largest share any single change gives "over bumps".
    expect(s.proposedStrength).toBe("strong");
    expect(s.proposedColumn[2]).toBeCloseTo(0.75, 12);
    expect(s.optionLabel).toBe("Over bumps, even when not pedalling");
  });

  it("uses the shop's strength weights for the authored side", async () => {
    await db.insert(settings).values({ key: DIAGNOSIS_SETTINGS_KEY, value: { weights: { against: 0.5 } } });
    try {
      const s = (await reviewVersion(versionId)).suggestions.find((x) => x.nodeKey === "q-when" && x.causeSlug === CAUSE)!;
      // Hand computation: 0.5 / (1 + 1 + 0.5 + 1).
      expect(s.rows[2].authored).toBeCloseTo(0.5 / 3.5, 12);
    } finally {
      await db.delete(settings).where(eq(settings.key, DIAGNOSIS_SETTINGS_KEY));
    }
  });

  it("the stored table is what the engine learns from the closed cases as they are after each change", async () => {
    const first = await storedLikelihoods(versionId);
    expect(first).toEqual((await reviewVersion(versionId)).likelihoods);
    expect(first![OPTION][CAUSE]).toBeGreaterThan(0.99);
    await insertCases(ids, [{ ...bolts, answers: ["o-when-load"], closedAt: day("2025-04-02") }]);
    const after = await storedLikelihoods(versionId);
    const graph = (await loadGraph(versionId))!;
    expect(after).toEqual(learnLikelihoods(toDxTree(graph), await closedCasesOf(versionId)).likelihoods);
    expect(after![OPTION][CAUSE]).toBeLessThan(first![OPTION][CAUSE]);
  });

  it("a technician may not accept a suggestion", async () => {
    const result = await executeAction(acceptSuggestionAction, { treeId: String(treeId), versionId: String(versionId), optionKey: OPTION, causeSlug: CAUSE }, users.tech);
    expect(!result.ok && result.status).toBe(403);
  });

  it("accepting writes the nearest strength into a new draft started from the published version", async () => {
    const before = (await loadGraph(versionId))!;
    const result = await executeAction(acceptSuggestionAction, { treeId: String(treeId), versionId: String(versionId), optionKey: OPTION, causeSlug: CAUSE }, users.senior);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const [draft] = await db.select().from(treeVersions).where(and(eq(treeVersions.treeId, treeId), eq(treeVersions.state, "draft")));
    expect(draft.id).toBe(result.data.draftVersionId);
    expect(draft.basedOnVersionId).toBe(versionId);
    const graph = (await loadGraph(draft.id))!;
    expect(graph.options.find((o) => o.key === OPTION)!.evidence[CAUSE]).toBe("strong");
    // Everything else is as published.
    const strip = (g: typeof graph) => g.options.map((o) => ({ key: o.key, evidence: o.key === OPTION ? { ...o.evidence, [CAUSE]: "x" } : o.evidence }));
    expect(strip(graph)).toEqual(strip(before));
    // The published version itself is untouched (and frozen).
    expect((await loadGraph(versionId))!.options.find((o) => o.key === OPTION)!.evidence[CAUSE]).toBe("against");

    const review = await treeReview(treeId);
    expect(review!.suggestions.find((s) => s.optionKey === OPTION)!.draftStrength).toBe("strong");
  });

  it("the tree setting: decide from the history, or pin authored or learned", async () => {
    const denied = await executeAction(setLikelihoodModeAction, { treeId: String(treeId), mode: "learned" }, users.tech);
    expect(!denied.ok && denied.status).toBe(403);
    const bad = await executeAction(setLikelihoodModeAction, { treeId: String(treeId), mode: "guessed" }, users.senior);
    expect(!bad.ok && bad.status).toBe(400);
    const [fresh] = await db.select({ mode: trees.likelihoodMode }).from(trees).where(eq(trees.id, treeId));
    expect(fresh.mode).toBe("auto");
    const ok = await executeAction(setLikelihoodModeAction, { treeId: String(treeId), mode: "authored" }, users.senior);
    expect(ok.ok).toBe(true);
    const [row] = await db.select({ mode: trees.likelihoodMode }).from(trees).where(eq(trees.id, treeId));
    expect(row.mode).toBe("authored");
    expect((await treeReview(treeId))!.inUse).toMatchObject({ source: "authored", why: expect.stringContaining("pinned") });
    await executeAction(setLikelihoodModeAction, { treeId: String(treeId), mode: "auto" }, users.senior);
  });

  it("left to decide, a tree scores with learned likelihoods once its published version has enough closed cases", async () => {
    const { cases: closed } = await reviewVersion(versionId);
    expect(closed).toBeLessThan(ENOUGH_HISTORY);
    expect((await treeReview(treeId))!.inUse).toMatchObject({ source: "authored", why: expect.stringContaining(`${closed} closed cases`) });
    await insertCases(ids, times(ENOUGH_HISTORY - closed, { ...bolts, closedAt: day("2025-04-03") }));
    expect(await storedLikelihoods(versionId)).toEqual((await reviewVersion(versionId)).likelihoods);
    expect((await treeReview(treeId))!.inUse).toMatchObject({ source: "learned", why: expect.stringContaining(`${ENOUGH_HISTORY} closed cases`) });
  });
});
