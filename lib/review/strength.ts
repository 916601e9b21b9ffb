import { DEFAULT_WEIGHTS, STRENGTHS as STRENGTH_ORDER, type Strength } from "@/lib/diagnosis";

export interface OptionEvidence {
  key: string;
  /** Strength for the cause in question; a cause the answer does not name is neutral. */
  strength: Strength;
}

/**
 * P(o|k) of every strength the editor could give option `optionKey` for one cause, with the node's
 * other answers (don't-know excluded) kept as authored: λ(s) / (λ(s) + Σ other λ), the engine's
 * normalisation with the default weights (as learnLikelihoods uses for the authored value).
 */
export function likelihoodByStrength(outcomes: OptionEvidence[], optionKey: string): Record<Strength, number> {
  const others = outcomes.filter((o) => o.key !== optionKey).reduce((s, o) => s + DEFAULT_WEIGHTS[o.strength], 0);
  const m = outcomes.length;
  const out = {} as Record<Strength, number>;
  for (const s of STRENGTH_ORDER) {
    const total = DEFAULT_WEIGHTS[s] + others;
    // Every answer ruling the cause out is treated as neutral by the engine: uniform.
    out[s] = total > 0 ? DEFAULT_WEIGHTS[s] / total : 1 / m;
  }
  return out;
}

/**
 * The strength whose normalised likelihood is nearest the learned value (ties go to the milder
 * strength). "Rules out" is only proposed for a learned value of exactly 0: a cause never seen
 * with an answer in a few dozen cases is unlikely with it, not impossible.
 */
export function nearestStrength(outcomes: OptionEvidence[], optionKey: string, learned: number): { strength: Strength; value: number } {
  const values = likelihoodByStrength(outcomes, optionKey);
  let best: Strength = "neutral";
  for (const s of STRENGTH_ORDER) {
    if (s === "rules_out" && learned > 0) continue;
    const d = Math.abs(values[s] - learned);
    const bestD = Math.abs(values[best] - learned);
    if (d < bestD - 1e-12 || (Math.abs(d - bestD) <= 1e-12 && distanceFromNeutral(s) < distanceFromNeutral(best))) best = s;
  }
  return { strength: best, value: values[best] };
}

function distanceFromNeutral(s: Strength): number {
  return Math.abs(STRENGTH_ORDER.indexOf(s) - STRENGTH_ORDER.indexOf("neutral"));
}
