// A seeded world for the learning benchmark: random trees, a hidden "true" answer table that
// matches the tree, differs a little or differs badly, and cases drawn from that table.
import { DEFAULT_WEIGHTS, normaliseWeights, type ClosedCase, type DxAnswer, type DxOption, type DxTree, type Strength } from "@/lib/diagnosis";
import { prng } from "@/lib/random";

export type Wrongness = "right" | "a little wrong" | "badly wrong";

/** Rules-out is left out on purpose: with answer noise it would make log loss infinite for the authored table. */
const LADDER: Strength[] = ["against", "neutral", "for", "strong"];
export const ANSWER_NOISE = 0.06;
export const DONT_KNOW_RATE = 0.08;

export interface World {
  tree: DxTree;
  /** The table answers are really drawn from (noise included): option id → cause id → p. */
  truth: Record<string, Record<string, number>>;
  priors: number[];
}

type Random = () => number;
const int = (r: Random, lo: number, hi: number) => lo + Math.floor(r() * (hi - lo + 1));

/** A strength at least two steps up or down the ladder from `s`. */
function farFrom(r: Random, s: Strength): Strength {
  const i = LADDER.indexOf(s);
  const choices = LADDER.filter((_, j) => Math.abs(j - i) >= 2);
  return choices[Math.floor(r() * choices.length)];
}

/**
 * 3–5 answers per question, 6–15 causes, 10–16 questions; every answer leads one to four
 * questions on, so a case is asked about five of them. Half the cells are neutral.
 */
export function makeWorld(seed: number, wrongness: Wrongness): World {
  const r = prng(seed);
  const K = int(r, 6, 15);
  const Q = int(r, 10, 16);
  const causes = Array.from({ length: K }, (_, k) => ({ id: `c${k}`, priorWeight: int(r, 1, 9) }));
  const nodes = Array.from({ length: Q }, (_, q) => ({ id: `q${q}`, kind: "question" as const }));
  const options: DxOption[] = [];
  const trueStrength = new Map<string, Record<string, Strength>>();
  for (let q = 0; q < Q; q++) {
    const m = int(r, 3, 5);
    const nodeOptions: DxOption[] = [];
    for (let o = 0; o < m; o++) {
      const next = q + int(r, 1, 4);
      const evidence: Record<string, Strength> = {};
      for (const c of causes) if (r() < 0.5) evidence[c.id] = LADDER[Math.floor(r() * LADDER.length)];
      nodeOptions.push({ id: `q${q}-o${o}`, nodeId: `q${q}`, to: next < Q ? `q${next}` : null, label: `answer ${o}`, evidence });
    }
    for (const o of nodeOptions) trueStrength.set(o.id, { ...(o.evidence as Record<string, Strength>) });
    const wrongCells: [DxOption, string][] = [];
    if (wrongness === "badly wrong") {
      const o = nodeOptions[Math.floor(r() * m)];
      for (const c of causes) if (r() < 0.5) wrongCells.push([o, c.id]);
    }
    for (const [o, causeId] of wrongCells) trueStrength.get(o.id)![causeId] = farFrom(r, (o.evidence[causeId] as Strength | undefined) ?? "neutral");
    options.push(...nodeOptions);
    if (r() < 0.5) options.push({ id: `q${q}-dk`, nodeId: `q${q}`, to: nodeOptions[0].to, label: "don't know", dontKnow: true, evidence: {} });
  }
  if (wrongness === "a little wrong") {
    const answerable = options.filter((o) => !o.dontKnow);
    for (let i = 0; i < 3; i++) {
      const o = answerable[Math.floor(r() * answerable.length)];
      const causeId = causes[Math.floor(r() * K)].id;
      trueStrength.get(o.id)![causeId] = farFrom(r, (o.evidence[causeId] as Strength | undefined) ?? "neutral");
    }
  }

  const truth: World["truth"] = {};
  for (const node of nodes) {
    const outs = options.filter((o) => o.nodeId === node.id && !o.dontKnow);
    for (const c of causes) {
      const p = normaliseWeights(outs.map((o) => DEFAULT_WEIGHTS[trueStrength.get(o.id)![c.id] ?? "neutral"]));
      outs.forEach((o, i) => ((truth[o.id] ??= {})[c.id] = (1 - ANSWER_NOISE) * p[i] + ANSWER_NOISE / outs.length));
    }
  }
  const total = causes.reduce((s, c) => s + c.priorWeight, 0);
  return { tree: { rootId: "q0", nodes, options, causes }, truth, priors: causes.map((c) => c.priorWeight / total) };
}

function pickIndex(r: Random, weights: number[]): number {
  let u = r() * weights.reduce((a, b) => a + b, 0);
  for (let i = 0; i < weights.length; i++) if ((u -= weights[i]) < 0) return i;
  return weights.length - 1;
}

/** Cases of causes drawn from the priors, answered from the true table along the tree's edges. */
export function drawCases(world: World, count: number, seed: number): ClosedCase[] {
  const r = prng(seed);
  const { tree, truth } = world;
  const byNode = new Map<string, DxOption[]>();
  for (const o of tree.options) byNode.set(o.nodeId, [...(byNode.get(o.nodeId) ?? []), o]);
  return Array.from({ length: count }, () => {
    const cause = tree.causes[pickIndex(r, world.priors)].id;
    const answers: DxAnswer[] = [];
    for (let at: string | null = tree.rootId; at; ) {
      const all: DxOption[] = byNode.get(at)!;
      const dontKnow = all.find((o) => o.dontKnow);
      const outs = all.filter((o) => !o.dontKnow);
      const chosen: DxOption = dontKnow && r() < DONT_KNOW_RATE ? dontKnow : outs[pickIndex(r, outs.map((o) => truth[o.id][cause]))];
      answers.push({ nodeId: at, optionId: chosen.id });
      at = chosen.to;
    }
    return { answers, confirmedCauseId: cause };
  });
}
