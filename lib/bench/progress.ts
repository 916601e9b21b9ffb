import { companionFigures, DEFAULT_WEIGHTS, teardownPlan } from "@/lib/diagnosis";
import type { BenchInputs, BenchProgress, CompanionSuggestion, RankedCause, StageInfo } from "./types";

/**
 * How strongly one inspection's result counts, as a likelihood ratio for the inspected cause
 * against every other hypothesis: "found" counts as the strongest evidence the trees use, "not
 * found" as its inverse (an inspection can miss a fault, so it never rules a cause out).
 */
export const FOUND_RATIO = DEFAULT_WEIGHTS.strong;
export const NOT_FOUND_RATIO = 1 / DEFAULT_WEIGHTS.strong;

/** Companions shown need at least this many closed cases with both causes, and a lift above 1. */
export const COMPANION_MIN_TOGETHER = 2;

function ancestors(stage: string, bySlug: ReadonlyMap<string, StageInfo>): string[] {
  const out: string[] = [];
  for (let s = bySlug.get(stage); s; s = s.parent === null ? undefined : bySlug.get(s.parent)) out.push(s.slug);
  return out;
}

/**
 * The bench step of a case worked out from the triage ranking and the findings so far: the
 * ranking updated by the findings (single fault, Bayes' rule with the ratios above), the
 * optimal teardown order of what is left (stages already open cost nothing more), the
 * companions worth a look inside the open stages, and the labour so far.
 */
export function benchProgress(input: BenchInputs): BenchProgress {
  const bySlug = new Map(input.stages.map((s) => [s.slug, s]));
  const resultOf = new Map(input.findings.map((f) => [f.cause, f.result]));

  // With no ranking to start from (nothing listed), every located cause starts equal.
  const listed = input.causes.some((c) => c.prior > 0);
  const weight = new Map(input.causes.map((c) => {
    const result = resultOf.get(c.slug);
    const ratio = result === "found" ? FOUND_RATIO : result === "not_found" ? NOT_FOUND_RATIO : 1;
    return [c.slug, (listed ? c.prior : 1) * ratio];
  }));
  const unlistedWeight = listed ? input.unlisted : 0;
  const total = [...weight.values()].reduce((s, w) => s + w, unlistedWeight) || 1;
  const probability = (slug: string) => weight.get(slug)! / total;

  const ranking: RankedCause[] = input.causes
    .map((c) => ({ slug: c.slug, name: c.name, probability: probability(c.slug), result: resultOf.get(c.slug) ?? null }))
    .sort((a, b) => b.probability - a.probability || a.name.localeCompare(b.name));

  const inspected = input.findings.filter((f) => f.result !== "not_done").map((f) => f.cause);
  const causeBySlug = new Map(input.causes.map((c) => [c.slug, c]));
  const open = new Set(inspected.flatMap((slug) => {
    const c = causeBySlug.get(slug);
    return c ? ancestors(c.stage, bySlug) : [];
  }));

  const left = input.causes.filter((c) => !resultOf.has(c.slug) && probability(c.slug) > 0);
  const plan = teardownPlan(
    input.stages.map((s) => ({ id: s.slug, parent: s.parent, openMinutes: open.has(s.slug) ? 0 : s.openMinutes })),
    left.map((c) => ({ causeId: c.slug, assemblyId: c.stage, minutes: c.inspectMinutes, probability: probability(c.slug) })),
  );
  const checklist = plan.steps.map((step) => {
    const c = causeBySlug.get(step.causeId)!;
    // Stages already open cost nothing more and are not opened again.
    const opens = step.opens.filter((s) => !open.has(s)).map((s) => bySlug.get(s)!);
    return { cause: c.slug, name: c.name, stage: c.stage, opens, minutes: step.minutes, reachProbability: step.reachProbability };
  });

  const found = input.findings.filter((f) => f.result === "found").map((f) => f.cause);
  const teardownMinutes =
    [...open].reduce((s, slug) => s + bySlug.get(slug)!.openMinutes + bySlug.get(slug)!.closeMinutes, 0) +
    inspected.reduce((s, slug) => s + (causeBySlug.get(slug)?.inspectMinutes ?? 0), 0);
  const repairMinutes = found.reduce((s, slug) => s + (causeBySlug.get(slug)?.labourMinutes ?? 0), 0);

  const proposed = new Map<number, number>();
  for (const slug of found) for (const p of causeBySlug.get(slug)?.parts ?? []) proposed.set(p.id, Math.max(proposed.get(p.id) ?? 0, p.quantity));

  return {
    ranking,
    unlisted: unlistedWeight / total,
    checklist,
    expectedMinutesLeft: plan.expectedMinutes,
    openStages: input.stages.filter((s) => open.has(s.slug)).map((s) => s.slug),
    found,
    companions: companionsInside(open, found.length ? found : ranking.slice(0, 1).map((r) => r.slug), input, resultOf),
    teardownMinutes,
    labourEstimate: teardownMinutes + repairMinutes,
    proposedParts: [...proposed].map(([id, quantity]) => ({ id, quantity })),
  };
}

/** Causes inside the open stages, not yet inspected, that the shop often confirmed together with `given`: cheapest first. */
function companionsInside(
  open: ReadonlySet<string>,
  given: string[],
  input: BenchInputs,
  resultOf: ReadonlyMap<string, string>,
): CompanionSuggestion[] {
  if (open.size === 0 || input.history.length === 0) return [];
  const best = new Map<string, CompanionSuggestion>();
  const causeBySlug = new Map(input.causes.map((c) => [c.slug, c]));
  for (const g of given) {
    for (const figures of companionFigures(input.history, g)) {
      const c = causeBySlug.get(figures.cause);
      if (!c || resultOf.has(c.slug) || given.includes(c.slug) || !open.has(c.stage)) continue;
      if (figures.together < COMPANION_MIN_TOGETHER || figures.lift <= 1) continue;
      const seen = best.get(c.slug);
      if (!seen || figures.lift > seen.figures.lift) best.set(c.slug, { cause: c.slug, name: c.name, stage: c.stage, inspectMinutes: c.inspectMinutes, givenName: causeBySlug.get(g)?.name ?? g, figures });
    }
  }
  return [...best.values()].sort((a, b) => a.inspectMinutes - b.inspectMinutes || b.figures.lift - a.figures.lift || a.cause.localeCompare(b.cause));
}
