/**
 * mulberry32, a small seeded PRNG: the demo history, the benchmarks' generated data and the
 * property tests come out the same on every machine and every run.
 */
export function prng(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** The seeded PRNG with the draws the seed's simulation needs. */
export class Random {
  readonly next: () => number;

  constructor(seed: number) {
    this.next = prng(seed);
  }

  int(min: number, maxInclusive: number): number {
    return min + Math.floor(this.next() * (maxInclusive - min + 1));
  }

  pick<T>(items: readonly T[]): T {
    return items[Math.floor(this.next() * items.length)];
  }

  /** Index drawn in proportion to the weights (all ≥ 0, at least one > 0). */
  weightedIndex(weights: readonly number[]): number {
    const total = weights.reduce((a, b) => a + b, 0);
    let r = this.next() * total;
    for (let i = 0; i < weights.length; i++) {
      r -= weights[i];
      if (r < 0) return i;
    }
    return weights.length - 1;
  }

  weighted<T>(entries: readonly (readonly [T, number])[]): T {
    return entries[this.weightedIndex(entries.map((e) => e[1]))][0];
  }

  chance(p: number): boolean {
    return this.next() < p;
  }
}
