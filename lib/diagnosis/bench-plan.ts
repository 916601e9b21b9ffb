import { DiagnosisError } from "./errors";
import { requirePositive, requireProbability } from "./guards";
import type { BenchItem, BenchPlan } from "./types";

const SUM_TOLERANCE = 1e-9;

/**
 * Inspection order by decreasing p/c (ties: cheaper first, then id), which minimises the
 * expected minutes Σ c_i·(1 − Σ_{j<i} p_j) under a single fault (Kadane & Simon 1977;
 * Heckerman, Breese & Rommelse 1995). The probabilities are used as given: straight from
 * scoreCauses they may sum to less than 1 (the unlisted share), in which case the expected
 * minutes count the chance that every inspection is needed. They may not sum to more than 1.
 */
export function benchPlan(items: BenchItem[]): BenchPlan {
  if (!Array.isArray(items)) throw new DiagnosisError("empty_input", "benchPlan needs an array of items");
  const ids = new Set<string>();
  let total = 0;
  for (const item of items) {
    if (ids.has(item.id)) throw new DiagnosisError("duplicate_id", `Two bench items share the id ${JSON.stringify(item.id)}`);
    ids.add(item.id);
    total += requireProbability(item.probability, `probability of bench item ${JSON.stringify(item.id)}`);
    requirePositive(item.costMinutes, `costMinutes of bench item ${JSON.stringify(item.id)}`, "bad_cost");
  }
  if (total > 1 + SUM_TOLERANCE) {
    throw new DiagnosisError("bad_probability", `Bench item probabilities sum to ${total}, more than 1`);
  }

  const sorted = [...items].sort(
    (a, b) =>
      b.probability / b.costMinutes - a.probability / a.costMinutes ||
      a.costMinutes - b.costMinutes ||
      (a.id < b.id ? -1 : a.id > b.id ? 1 : 0),
  );
  return { order: sorted.map((i) => i.id), expectedMinutes: expectedMinutes(sorted) };
}

/** Σ c_i·(1 − Σ_{j<i} p_j) for items inspected in the given order. */
export function expectedMinutes(ordered: BenchItem[]): number {
  let found = 0;
  let minutes = 0;
  for (const item of ordered) {
    minutes += item.costMinutes * Math.max(0, 1 - found);
    found += item.probability;
  }
  return minutes;
}
