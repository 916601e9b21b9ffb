import { DEFAULT_WEIGHTS, benchPlan, rankNextQuestions, scoreCauses, suggestConclusion, walkPath } from "@/lib/diagnosis";
import type { DxAnswer, DxOption, DxSettings, DxTree, Strength } from "@/lib/diagnosis";
import type { StoredRanking } from "@/lib/triage/ranking-types";
import { finalRankingOf } from "@/lib/triage/ranking-types";
import type { Cause, Scenario } from "@/db/seed/content";
import { callerContact, callerName, serialFor } from "./names";
import { Random } from "@/lib/random";

export interface SimTree {
  slug: string;
  symptom: string;
  dx: DxTree;
}

export interface SimStep {
  nodeKey: string;
  optionKey: string;
  at: Date;
  ranking: StoredRanking;
}

export interface SimCase {
  reference: string;
  status: "open" | "advised" | "booked_in" | "on_bench" | "closed";
  callerKind: "rider" | "dealer";
  callerName: string;
  phone: string;
  email: string;
  familySlug: string;
  serial: string;
  ridingUse: "road" | "trail" | "cargo" | "commuting";
  treeSlug: string;
  symptom: string;
  technicianRole: "tech" | "senior";
  createdAt: Date;
  triagedAt: Date | null;
  closedAt: Date | null;
  steps: SimStep[];
  finalRanking: Record<string, number> | null;
  quote: { low: number; high: number } | null;
  benchPlan: { order: string[]; expectedMinutes: number } | null;
  outcome: {
    causes: { slug: string; primary: boolean }[];
    parts: { slug: string; quantity: number }[];
    labourMinutes: number;
    upgrades: string;
    notes: string;
  } | null;
  /** Index (in the returned array) of the earlier case of the same serial, when this unit came back. */
  repeatOf: number | null;
  notes: string;
}

export interface SimulationInput {
  scenario: Scenario;
  causes: Cause[];
  trees: SimTree[];
  /** The last day of the simulated period (cases run back `scenario.months` from here). */
  anchor: Date;
}

const UPGRADES: Record<string, string> = {
  clutch: "Uprated one-way clutch fitted",
  seal: "Outer crank seal and grease barrier added",
  bearing: "Sealed bearings fitted, housing dried and re-greased",
  housing: "Housing screws sealed with thread sealant",
  electronics: "Board conformal-coated after cleaning",
  drive_train: "",
  sensor: "",
  cable: "Cable re-routed with a protective sleeve",
  firmware: "",
};

const DAY = 86_400_000;

/** P(o | cause) over a node's answerable options, as the engine defines it with default weights. */
function optionDistribution(options: DxOption[], causeId: string): number[] {
  const raw = options.map((o) => {
    const w = o.evidence[causeId] ?? "neutral";
    return typeof w === "number" ? w : DEFAULT_WEIGHTS[w as Strength];
  });
  const total = raw.reduce((a, b) => a + b, 0);
  return total > 0 ? raw : options.map(() => 1);
}

function rankingFor(tree: DxTree, answers: DxAnswer[], settings: DxSettings): StoredRanking {
  const scores = scoreCauses(tree, answers, settings);
  const suggestions = rankNextQuestions(tree, answers, settings).slice(0, 3);
  const conclusion = suggestConclusion(tree, answers, settings);
  return {
    causes: scores.causes.map((c) => ({ causeId: c.causeId, probability: c.probability, ruledOutBy: c.ruledOutBy })),
    unlisted: scores.unlisted,
    suggestions,
    conclusion,
  };
}

/** Walks the tree's default path as a caller whose unit has `trueCause` would answer. */
function walkAsCaller(rng: Random, authored: DxTree, actual: DxTree, trueCause: string, scenario: Scenario, start: Date, settings: DxSettings, maxSteps = 40) {
  const answers: DxAnswer[] = [];
  const steps: SimStep[] = [];
  const optionsOf = new Map<string, DxOption[]>();
  for (const o of actual.options) optionsOf.set(o.nodeId, [...(optionsOf.get(o.nodeId) ?? []), o]);
  for (let i = 0; i < maxSteps; i++) {
    const current = walkPath(authored, answers).current;
    if (!current) break;
    const all = optionsOf.get(current) ?? [];
    const answerable = all.filter((o) => !o.dontKnow);
    const dontKnow = all.find((o) => o.dontKnow);
    if (answerable.length === 0) break;
    let chosen: DxOption;
    if (dontKnow && rng.chance(scenario.dontKnowRate)) chosen = dontKnow;
    else if (rng.chance(scenario.answerNoise)) chosen = rng.pick(answerable);
    else chosen = answerable[rng.weightedIndex(optionDistribution(answerable, trueCause))];
    answers.push({ nodeId: current, optionId: chosen.id });
    steps.push({ nodeKey: current, optionKey: chosen.id, at: new Date(start.getTime() + (i + 1) * 45_000), ranking: rankingFor(authored, answers, settings) });
  }
  return steps;
}

/** Applies the scenario's deliberately wrong evidence: the world answers by `actual`, the tree says `authored`. */
export function actualTree(tree: SimTree, scenario: Scenario): DxTree {
  const wrong = scenario.misweighted.filter((m) => m.tree === tree.slug);
  if (!wrong.length) return tree.dx;
  return {
    ...tree.dx,
    options: tree.dx.options.map((o) => {
      const fixes = wrong.filter((m) => m.option === o.id);
      if (!fixes.length) return o;
      const evidence = { ...o.evidence };
      for (const f of fixes) evidence[f.cause] = f.actual;
      return { ...o, evidence };
    }),
  };
}

/**
 * Generates the demo shop's past: closed cases in date order (priors learn from the history so
 * far, as the live app does), then a few open cases in every status. Pure and deterministic.
 */
export function simulateHistory(input: SimulationInput): SimCase[] {
  const { scenario, causes, trees, anchor } = input;
  const rng = new Random(scenario.seed);
  const causeBySlug = new Map(causes.map((c) => [c.slug, c]));
  const actualBySlug = new Map(trees.map((t) => [t.slug, actualTree(t, scenario)]));
  const families = Object.entries(scenario.families);
  const start = new Date(anchor.getTime() - scenario.months * 30.44 * DAY);

  const createdTimes = Array.from({ length: scenario.closedCases }, () => start.getTime() + rng.next() * (anchor.getTime() - start.getTime() - 21 * DAY));
  createdTimes.sort((a, b) => a - b);

  const history = new Map<string, Record<string, number>>();
  const monthSeq = new Map<string, number>();
  const lastBySerialFamily = new Map<string, { index: number; at: number; serial: string }[]>();
  const out: SimCase[] = [];

  const reference = (at: Date) => {
    const yymm = `${String(at.getUTCFullYear()).slice(2)}${String(at.getUTCMonth() + 1).padStart(2, "0")}`;
    const n = (monthSeq.get(yymm) ?? 0) + 1;
    monthSeq.set(yymm, n);
    return `WD-${yymm}-${String(n).padStart(4, "0")}`;
  };

  const drawCase = (createdAt: Date) => {
    const [familySlug, family] = rng.weighted(families.map(([slug, f]) => [[slug, f] as const, f.caseShare] as const));
    const ridingUse = rng.weighted(Object.entries(family.ridingUse) as [SimCase["ridingUse"], number][]);
    const month = createdAt.getUTCMonth() + 1;
    const wet = scenario.water.wetMonths.includes(month);
    const useFactors = scenario.ridingUseFactors[ridingUse] ?? {};
    const trueCause = rng.weighted(Object.entries(family.causeRates).map(([slug, rate]) => {
      let w = rate * (useFactors[slug] ?? 1);
      if (wet && scenario.water.causes.includes(slug)) w *= scenario.water.boost;
      return [slug, w] as const;
    }));
    const candidates = trees.filter((t) => t.dx.causes.some((c) => c.id === trueCause));
    const tree = candidates.length
      ? rng.weighted(candidates.map((t) => [t, scenario.symptomShare[t.slug] ?? 0.1] as const))
      : rng.pick(trees);
    const callerKind: SimCase["callerKind"] = rng.chance(scenario.callerMix.dealer) ? "dealer" : "rider";
    const name = callerName(rng, callerKind);
    return { familySlug, ridingUse, trueCause, tree, callerKind, name, ...callerContact(rng, name) };
  };

  for (const t of createdTimes) {
    const createdAt = new Date(t);
    const d = drawCase(createdAt);
    const settings: DxSettings = { history: { ...(history.get(d.familySlug) ?? {}) } };
    const steps = walkAsCaller(rng, d.tree.dx, actualBySlug.get(d.tree.slug)!, d.trueCause, scenario, createdAt, settings);
    const last = steps.at(-1)?.ranking ?? rankingFor(d.tree.dx, [], settings);
    const triagedAt = new Date(createdAt.getTime() + (steps.length + 2) * 45_000);

    // Units that come back: the same serial within 90 days of an earlier visit.
    const key = d.familySlug;
    const earlier = (lastBySerialFamily.get(key) ?? []).filter((e) => t - e.at < 80 * DAY);
    const repeat = earlier.length > 0 && rng.chance(0.03) ? rng.pick(earlier) : null;
    const serial = repeat?.serial ?? serialFor(rng, d.familySlug);

    const advisedOnly = rng.chance(0.07);
    const cause = causeBySlug.get(d.trueCause);
    const secondPool = Object.keys(scenario.families[d.familySlug].causeRates).filter((s) => s !== d.trueCause);
    const second = !advisedOnly && rng.chance(scenario.secondCauseRate) ? rng.pick(secondPool) : null;
    const confirmed = [d.trueCause, ...(second ? [second] : [])];
    const closedAt = new Date(triagedAt.getTime() + rng.int(2, 18) * DAY + rng.int(0, 8) * 3_600_000);
    const candidatesForPlan = last.causes.filter((c) => c.probability >= 0.05).slice(0, 6);
    const plan = candidatesForPlan.length
      ? benchPlan(candidatesForPlan.map((c) => ({ id: c.causeId, probability: c.probability, costMinutes: causeBySlug.get(c.causeId)?.inspectMinutes ?? 15 })))
      : null;
    const quoteCauses = last.causes.filter((c) => c.probability >= 0.1).map((c) => causeBySlug.get(c.causeId)).filter((c): c is Cause => !!c);

    out.push({
      reference: reference(createdAt),
      status: advisedOnly ? "advised" : "closed",
      callerKind: d.callerKind, callerName: d.name, phone: d.phone, email: d.email,
      familySlug: d.familySlug, serial, ridingUse: d.ridingUse, treeSlug: d.tree.slug, symptom: d.tree.symptom,
      technicianRole: rng.chance(0.7) ? "tech" : "senior",
      createdAt, triagedAt, closedAt: advisedOnly ? null : closedAt,
      steps, finalRanking: finalRankingOf(last),
      quote: quoteCauses.length ? { low: Math.min(...quoteCauses.map((c) => c.priceLowEur)), high: Math.max(...quoteCauses.map((c) => c.priceHighEur)) } : null,
      benchPlan: plan,
      outcome: advisedOnly || !cause ? null : {
        causes: confirmed.map((slug, i) => ({ slug, primary: i === 0 })),
        parts: confirmed.flatMap((slug) => causeBySlug.get(slug)?.parts.map((p) => ({ slug: p.part, quantity: p.quantity })) ?? []),
        labourMinutes: Math.round(cause.labourMinutes * (0.8 + rng.next() * 0.5)),
        upgrades: UPGRADES[cause.area] ?? "",
        notes: `Confirmed on the bench: ${cause.name.toLowerCase()}.`,
      },
      repeatOf: repeat ? repeat.index : null,
      notes: advisedOnly ? "Talked the caller through it; no need to send the unit." : "",
    });
    if (!advisedOnly) {
      const counts = history.get(d.familySlug) ?? {};
      for (const slug of confirmed) counts[slug] = (counts[slug] ?? 0) + 1;
      history.set(d.familySlug, counts);
    }
    lastBySerialFamily.set(key, [...earlier, { index: out.length - 1, at: t, serial }].slice(-40));
  }

  // A few live cases in every status, in the last fortnight.
  for (const status of ["open", "advised", "booked_in", "on_bench"] as const) {
    for (let i = 0; i < scenario.openCasesPerStatus; i++) {
      const createdAt = new Date(anchor.getTime() - rng.next() * 14 * DAY);
      const d = drawCase(createdAt);
      const settings: DxSettings = { history: { ...(history.get(d.familySlug) ?? {}) } };
      const allSteps = walkAsCaller(rng, d.tree.dx, actualBySlug.get(d.tree.slug)!, d.trueCause, scenario, createdAt, settings);
      const steps = status === "open" ? allSteps.slice(0, Math.max(1, Math.floor(allSteps.length / 2))) : allSteps;
      const last = steps.at(-1)?.ranking ?? null;
      out.push({
        reference: reference(createdAt), status,
        callerKind: d.callerKind, callerName: d.name, phone: d.phone, email: d.email,
        familySlug: d.familySlug, serial: serialFor(rng, d.familySlug), ridingUse: d.ridingUse, treeSlug: d.tree.slug, symptom: d.tree.symptom,
        technicianRole: "tech", createdAt,
        triagedAt: status === "open" ? null : new Date(createdAt.getTime() + (steps.length + 2) * 45_000),
        closedAt: null, steps,
        finalRanking: status === "open" || !last ? null : finalRankingOf(last),
        quote: null, benchPlan: null, outcome: null, repeatOf: null, notes: "",
      });
    }
  }
  return out;
}
