import { DiagnosisError } from "./errors";
import { isNonNegativeNumber } from "./guards";
import { STRENGTHS, type Strength, type Weight } from "./types";

export type WeightTable = Readonly<Record<Strength, number>>;

export const DEFAULT_WEIGHTS: WeightTable = {
  rules_out: 0,
  against: 1 / 3,
  neutral: 1,
  for: 3,
  strong: 9,
};

export function isStrength(w: unknown): w is Strength {
  return typeof w === "string" && (STRENGTHS as readonly string[]).includes(w);
}

export function weightTable(overrides?: Partial<Record<Strength, number>>): WeightTable {
  const table: Record<Strength, number> = { ...DEFAULT_WEIGHTS };
  for (const s of STRENGTHS) {
    const v = overrides?.[s];
    if (v === undefined) continue;
    if (!isNonNegativeNumber(v)) {
      throw new DiagnosisError("bad_setting", `settings.weights.${s} must be a finite number ≥ 0, got ${String(v)}`);
    }
    table[s] = v;
  }
  return table;
}

/** Why a weight is unusable, or null when it is fine. */
export function weightProblem(w: unknown): string | null {
  if (typeof w === "number") {
    return isNonNegativeNumber(w) ? null : `weight must be a finite number ≥ 0, got ${String(w)}`;
  }
  return isStrength(w) ? null : `unknown strength ${JSON.stringify(w)}`;
}

export function weightValue(w: Weight, table: WeightTable, where: string): number {
  const problem = weightProblem(w);
  if (problem) throw new DiagnosisError("bad_weight", `${where}: ${problem}`);
  return typeof w === "number" ? w : table[w];
}
