import path from "node:path";
import { describe, expect, it } from "vitest";
import { simulateHistory, type SimCase } from "@/db/seed/history/simulate";
import { learnLikelihoods, rankingScores, validateTree } from "@/lib/diagnosis";
import { loadContent } from "@/db/seed/content";
import { treeFileToDxTree } from "@/lib/trees/file/schema";

const content = loadContent(path.resolve(__dirname, "../../../content"));
const trees = content.trees.map((t) => ({ slug: t.slug, symptom: t.symptom, dx: treeFileToDxTree(t, content.causes) }));
const anchor = new Date("2026-11-01T00:00:00Z");
const run = () => simulateHistory({ scenario: content.scenario, causes: content.causes, trees, anchor });
const sims = run();
const closed = sims.filter((s) => s.status === "closed");

describe("the demo history simulator", () => {
  it("is deterministic: the same seed and anchor give the same cases", () => {
    const again = run();
    expect(again.length).toBe(sims.length);
    const digest = (list: SimCase[]) => JSON.stringify(list.map((s) => [s.reference, s.familySlug, s.serial, s.steps.map((st) => st.optionKey), s.outcome?.causes]));
    expect(digest(again)).toBe(digest(sims));
  });

  it("makes about the scenario's number of closed cases over its months, plus live ones in every status", () => {
    const past = sims.slice(0, content.scenario.closedCases);
    expect(past.every((s) => s.status === "closed" || s.status === "advised")).toBe(true);
    expect(closed.length).toBeGreaterThan(content.scenario.closedCases * 0.85);
    for (const status of ["open", "advised", "booked_in", "on_bench"]) {
      expect(sims.filter((s) => s.status === status && !s.closedAt).length).toBeGreaterThanOrEqual(content.scenario.openCasesPerStatus);
    }
    const first = Math.min(...closed.map((s) => s.createdAt.getTime()));
    expect((anchor.getTime() - first) / 86_400_000).toBeGreaterThan(content.scenario.months * 30 - 40);
  });

  it("draws more water damage in wet months", () => {
    const water = new Set(content.scenario.water.causes);
    const wetMonths = new Set(content.scenario.water.wetMonths);
    const share = (wet: boolean) => {
      const list = closed.filter((s) => wetMonths.has(s.createdAt.getUTCMonth() + 1) === wet);
      return list.filter((s) => water.has(s.outcome!.causes[0].slug)).length / list.length;
    };
    expect(share(true)).toBeGreaterThan(share(false) * 1.2);
  });

  it("every seeded tree validates", () => {
    for (const t of trees) expect(validateTree(t.dx), t.slug).toEqual([]);
  });

  it("the trees rank the confirmed cause first far more often than chance", () => {
    const rows = closed.map((s) => ({ probabilities: s.finalRanking!, confirmed: s.outcome!.causes[0].slug }));
    const scores = rankingScores(rows);
    expect(scores.top1).toBeGreaterThan(0.3);
    expect(scores.top3).toBeGreaterThan(scores.top1);
  });

  it("the evidence review finds the deliberately mis-weighted options, and few others", () => {
    const found: string[] = [];
    for (const t of trees) {
      const cases = closed.filter((s) => s.treeSlug === t.slug).map((s) => ({
        answers: s.steps.map((st) => ({ nodeId: st.nodeKey, optionId: st.optionKey })),
        confirmedCauseId: s.outcome!.causes[0].slug,
      }));
      for (const sg of learnLikelihoods(t.dx, cases).suggestions) found.push(`${t.slug}/${sg.optionId}/${sg.causeId}`);
    }
    const planted = content.scenario.misweighted.map((m) => `${m.tree}/${m.option}/${m.cause}`);
    for (const p of planted) expect(found).toContain(p);
    const others = found.filter((f) => !planted.includes(f));
    expect(others.length, others.join("\n")).toBeLessThanOrEqual(planted.length * 2);
  });
});
