import { benchPlan, type BenchPlan } from "@/lib/diagnosis";
import type { StoredRanking } from "./ranking-types";

export interface QuoteCause {
  slug: string;
  name: string;
  priceLowCents: number;
  priceHighCents: number;
  labourMinutes: number;
  inspectMinutes: number;
}

/** Causes at or above this probability make up the rough quote. */
export const QUOTE_MIN_PROBABILITY = 0.1;
const ROUND_TO_CENTS = 500;

export interface RoughQuote {
  lowCents: number;
  highCents: number;
  labourMinutes: number;
  basis: { slug: string; name: string; probability: number; weight: number }[];
}

/**
 * Probability-weighted price band over the causes at 10 % or more (their probabilities
 * renormalised to 1), rounded outwards to €5; the top cause alone when none reaches 10 %.
 * Labour is the same weighted mean of the causes' typical minutes.
 */
export function roughQuote(ranking: Pick<StoredRanking, "causes">, catalogue: ReadonlyMap<string, QuoteCause>): RoughQuote | null {
  const known = ranking.causes.filter((c) => c.probability > 0 && catalogue.has(c.causeId));
  if (known.length === 0) return null;
  const above = known.filter((c) => c.probability >= QUOTE_MIN_PROBABILITY);
  const picked = above.length > 0 ? above : [known.reduce((a, b) => (b.probability > a.probability ? b : a))];
  const total = picked.reduce((s, c) => s + c.probability, 0);
  let low = 0;
  let high = 0;
  let labour = 0;
  const basis = picked.map((c) => {
    const cause = catalogue.get(c.causeId)!;
    const weight = c.probability / total;
    low += weight * cause.priceLowCents;
    high += weight * cause.priceHighCents;
    labour += weight * cause.labourMinutes;
    return { slug: cause.slug, name: cause.name, probability: c.probability, weight };
  });
  return {
    lowCents: Math.floor(low / ROUND_TO_CENTS) * ROUND_TO_CENTS,
    highCents: Math.ceil(high / ROUND_TO_CENTS) * ROUND_TO_CENTS,
    labourMinutes: Math.round(labour),
    basis,
  };
}

/** The bench inspection order over every cause still possible, by p / inspection minutes. */
export function benchPlanFor(ranking: Pick<StoredRanking, "causes">, catalogue: ReadonlyMap<string, QuoteCause>): BenchPlan {
  const items = ranking.causes
    .filter((c) => c.probability > 0 && catalogue.has(c.causeId))
    .map((c) => ({ id: c.causeId, probability: c.probability, costMinutes: catalogue.get(c.causeId)!.inspectMinutes }));
  return benchPlan(items);
}
