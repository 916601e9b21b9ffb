import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { trees, treeVersions } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import { acceptSuggestionAction, setLikelihoodModeAction } from "@/lib/review/actions";
import { learnedLikelihoodsFor } from "@/lib/review/learned";
import { reviewVersion } from "@/lib/review/review";
import { treeReview } from "@/lib/review/queries";
import { loadGraph } from "@/lib/trees/graph";
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

  it("learns P(answer | cause) with the editor's prior and raises the suggestion", async () => {
    const review = await reviewVersion(versionId);
    expect(review.cases).toBe(30);
    const s = review.suggestions.find((x) => x.optionKey === OPTION && x.causeSlug === CAUSE)!;
    // Hand computation from DESIGN §4: authored (1/3) / (1 + 1 + 1/3 + 1) = 0.1 (load, always, bumps, backwards;
    // don't-know left out); learned (N + m·P_editor) / (N + m) = (30 + 5·0.1) / 35 with m = 5.
    expect(s.authored).toBeCloseTo(0.1, 12);
    expect(s.learned).toBeCloseTo(30.5 / 35, 12);
    expect(s.cases).toBe(30);
    expect(s.currentStrength).toBe("against");
    // Hand computation: strong gives 9 / (9 + 3) = 0.75, the nearest of the strengths to 0.871.
    expect(s.proposedStrength).toBe("strong");
    expect(s.proposedValue).toBeCloseTo(0.75, 12);
    expect(s.optionLabel).toBe("Over bumps, even when not pedalling");
  });

  it("learnedLikelihoodsFor learns from the closed cases as they are at each call", async () => {
    const first = await learnedLikelihoodsFor(versionId);
    expect(first![OPTION][CAUSE]).toBeCloseTo(30.5 / 35, 12);
    await insertCases(ids, [{ ...bolts, answers: ["o-when-load"], closedAt: day("2025-04-02") }]);
    const after = await learnedLikelihoodsFor(versionId);
    // Hand computation: 31 cases now, 30 over bumps: (30 + 0.5) / 36.
    expect(after![OPTION][CAUSE]).toBeCloseTo(30.5 / 36, 12);
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

  it("the tree setting switches between authored and learned likelihoods", async () => {
    const denied = await executeAction(setLikelihoodModeAction, { treeId: String(treeId), mode: "learned" }, users.tech);
    expect(!denied.ok && denied.status).toBe(403);
    const bad = await executeAction(setLikelihoodModeAction, { treeId: String(treeId), mode: "guessed" }, users.senior);
    expect(!bad.ok && bad.status).toBe(400);
    const ok = await executeAction(setLikelihoodModeAction, { treeId: String(treeId), mode: "learned" }, users.senior);
    expect(ok.ok).toBe(true);
    const [row] = await db.select({ mode: trees.likelihoodMode }).from(trees).where(eq(trees.id, treeId));
    expect(row.mode).toBe("learned");
  });
});
