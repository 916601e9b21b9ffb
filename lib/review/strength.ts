import { STRENGTHS as STRENGTH_ORDER, normaliseWeights, type Strength, type WeightTable } from "@/lib/diagnosis";

export interface OptionEvidence {
  key: string;
  /** Strength for the cause in question; a cause the answer does not name is neutral. */
  strength: Strength;
}

export interface StrengthEdit {
  optionKey: string;
  from: Strength;
  to: Strength;
  /** The column P(o|k) over the node's answers once the edit is made. */
  column: number[];
}

/** The column P(o|k) the engine derives from these strengths with the shop's weights, one answer optionally changed. */
export function columnOf(outcomes: OptionEvidence[], weights: WeightTable, change?: { optionKey: string; to: Strength }): number[] {
  return normaliseWeights(outcomes.map((o) => weights[change && o.key === change.optionKey ? change.to : o.strength]));
}

/** Σ p log(p / q): the log loss a column q adds when answers really follow p (∞ where q is 0 and p is not). */
function divergence(p: number[], q: number[]): number {
  let d = 0;
  for (let i = 0; i < p.length; i++) {
    if (p[i] === 0) continue;
    if (q[i] === 0) return Infinity;
    d += p[i] * Math.log(p[i] / q[i]);
  }
  return d;
}

function distanceFromNeutral(s: Strength): number {
  return Math.abs(STRENGTH_ORDER.indexOf(s) - STRENGTH_ORDER.indexOf("neutral"));
}

/**
 * The one change of one answer's strength that brings the column nearest the learned one (least
 * divergence of the learned column from it), or null when no single change comes nearer than the
 * column as written. Ties go to the milder strength. "Rules out" is only proposed where the learned
 * value is 0: an answer never seen with a cause in a few dozen cases is unlikely, not impossible.
 */
export function bestEdit(outcomes: OptionEvidence[], learned: number[], weights: WeightTable): StrengthEdit | null {
  let best: StrengthEdit | null = null;
  let bestD = divergence(learned, columnOf(outcomes, weights)) - 1e-9;
  for (const o of outcomes) {
    for (const to of STRENGTH_ORDER) {
      if (to === o.strength) continue;
      const column = columnOf(outcomes, weights, { optionKey: o.key, to });
      const d = divergence(learned, column);
      const tie = best !== null && Math.abs(d - bestD) <= 1e-12 && distanceFromNeutral(to) < distanceFromNeutral(best.to);
      if (d < bestD - 1e-12 || tie) {
        best = { optionKey: o.key, from: o.strength, to, column };
        bestD = d;
      }
    }
  }
  return best;
}

/** The proposal for a reviewed column: the best single edit, or, when none helps, the answer furthest from the history left as it is. */
export function proposalFor(outcomes: OptionEvidence[], authored: number[], learned: number[], weights: WeightTable): StrengthEdit {
  const edit = bestEdit(outcomes, learned, weights);
  if (edit) return edit;
  let far = 0;
  for (let o = 1; o < outcomes.length; o++) if (Math.abs(learned[o] - authored[o]) > Math.abs(learned[far] - authored[far])) far = o;
  return { optionKey: outcomes[far].key, from: outcomes[far].strength, to: outcomes[far].strength, column: authored };
}
