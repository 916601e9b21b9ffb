import { DiagnosisError } from "./errors";
import { requireNonNegative, requireProbability } from "./guards";

export interface Assembly {
  id: string;
  parent: string | null;
  openMinutes: number;
}

export interface BenchInspection {
  causeId: string;
  assemblyId: string;
  minutes: number;
  probability: number;
}

export interface TeardownStep {
  causeId: string;
  /** Assemblies this step opens first, outermost first. */
  opens: string[];
  /** Inspection minutes plus the opening minutes of `opens`. */
  minutes: number;
  /** 1 minus the probabilities of the steps before it. */
  reachProbability: number;
}

export interface TeardownPlan {
  order: string[];
  expectedMinutes: number;
  steps: TeardownStep[];
}

const SUM_TOLERANCE = 1e-9;

/** A run of work done back to back: its chance of finding the fault and its minutes. */
interface Block {
  p: number;
  c: number;
  causes: string[];
}

/** True when `a` should come before `b`: higher p/c, compared without dividing (c may be 0). */
function before(a: Block, b: Block): boolean {
  const lhs = a.p * b.c;
  const rhs = b.p * a.c;
  if (lhs !== rhs) return lhs > rhs;
  // Equal efficiency (two free inspections, say): the likelier first, which is never worse.
  if (a.p !== b.p) return a.p > b.p;
  if (a.c !== b.c) return a.c < b.c;
  return (a.causes[0] ?? "") < (b.causes[0] ?? "");
}

/** Merges chains whose blocks are each in non-increasing p/c into one such chain, keeping every chain's own order. */
function mergeChains(chains: Block[][]): Block[] {
  const heads = chains.map(() => 0);
  const merged: Block[] = [];
  for (;;) {
    let best = -1;
    for (let i = 0; i < chains.length; i++) {
      if (heads[i] >= chains[i].length) continue;
      if (best < 0 || before(chains[i][heads[i]], chains[best][heads[best]])) best = i;
    }
    if (best < 0) return merged;
    merged.push(chains[best][heads[best]++]);
  }
}

/**
 * The opening of an assembly must come before everything inside it. It starts a block that
 * absorbs the following blocks while they are at least as efficient as the block so far: the result
 * is the opening plus the most efficient prefix, followed by the rest unchanged.
 */
function prependOpening(openMinutes: number, chain: Block[]): Block[] {
  const head: Block = { p: 0, c: openMinutes, causes: [] };
  let i = 0;
  // A block as efficient as the head so far (a free inspection with no chance, say) is taken in
  // too: it leaves the head's efficiency as it is and must not stop the blocks behind it.
  while (i < chain.length && chain[i].p * head.c >= head.p * chain[i].c) {
    head.p += chain[i].p;
    head.c += chain[i].c;
    head.causes.push(...chain[i].causes);
    i++;
  }
  return [head, ...chain.slice(i)];
}

function checkAssemblies(assemblies: Assembly[]): { root: string; children: Map<string, string[]>; byId: Map<string, Assembly> } {
  if (!Array.isArray(assemblies) || assemblies.length === 0) {
    throw new DiagnosisError("no_root", "A teardown plan needs at least the unit as it arrives (one root assembly)");
  }
  const byId = new Map<string, Assembly>();
  for (const a of assemblies) {
    if (byId.has(a.id)) throw new DiagnosisError("duplicate_id", `Two assemblies share the id ${JSON.stringify(a.id)}`);
    byId.set(a.id, { id: a.id, parent: a.parent, openMinutes: a.openMinutes });
    requireNonNegative(a.openMinutes, () => `openMinutes of assembly ${JSON.stringify(a.id)}`, "bad_cost");
  }
  const roots = assemblies.filter((a) => a.parent === null);
  if (roots.length === 0) throw new DiagnosisError("no_root", "No assembly has parent null: the unit as it arrives is missing");
  if (roots.length > 1) {
    throw new DiagnosisError("several_roots", `Only one assembly may have parent null, found ${roots.map((r) => JSON.stringify(r.id)).join(", ")}`);
  }
  const children = new Map<string, string[]>(assemblies.map((a) => [a.id, []]));
  for (const a of assemblies) {
    if (a.parent === null) continue;
    if (!byId.has(a.parent)) {
      throw new DiagnosisError("unknown_assembly", `Assembly ${JSON.stringify(a.id)} names an unknown parent ${JSON.stringify(a.parent)}`);
    }
    children.get(a.parent)!.push(a.id);
  }
  // With one root and every parent known, an assembly the root cannot reach sits on a cycle.
  const reached = new Set<string>();
  const stack = [roots[0].id];
  while (stack.length > 0) {
    const id = stack.pop()!;
    reached.add(id);
    stack.push(...children.get(id)!);
  }
  const stray = assemblies.find((a) => !reached.has(a.id));
  if (stray) throw new DiagnosisError("cycle", `Assembly ${JSON.stringify(stray.id)} is its own ancestor (its parents form a cycle)`);
  return { root: roots[0].id, children, byId };
}

function checkInspections(inspections: BenchInspection[], byId: Map<string, Assembly>): void {
  if (!Array.isArray(inspections)) throw new DiagnosisError("empty_input", "teardownPlan needs an array of inspections");
  const causes = new Set<string>();
  let total = 0;
  for (const x of inspections) {
    const name = () => JSON.stringify(x.causeId);
    if (causes.has(x.causeId)) throw new DiagnosisError("duplicate_id", `Two inspections share the cause ${name()}`);
    causes.add(x.causeId);
    if (!byId.has(x.assemblyId)) {
      throw new DiagnosisError("unknown_assembly", `The inspection of ${name()} is in an unknown assembly ${JSON.stringify(x.assemblyId)}`);
    }
    requireNonNegative(x.minutes, () => `minutes of the inspection of ${name()}`, "bad_cost");
    total += requireProbability(x.probability, () => `probability of ${name()}`);
  }
  if (total > 1 + SUM_TOLERANCE) {
    throw new DiagnosisError("bad_probability", `Inspection probabilities sum to ${total}, more than 1 (single fault)`);
  }
}

/**
 * The inspection order through a unit's assemblies that minimises the expected minutes under a
 * single fault, each assembly opened once, when first needed, and left open: the bottom-up
 * P-over-C algorithm of Ottosen & Jensen, "The cost of troubleshooting cost clusters with inside
 * information" (UAI 2010). Every assembly, deepest first, merges its own inspections and its
 * children's chains by p/c and puts its opening in front, absorbing the most efficient prefix.
 * With everything in the root it is Kadane & Simon's p/c order. Probabilities may sum to less
 * than 1 (none of these): then every step may be reached.
 */
export function teardownPlan(assemblies: Assembly[], inspections: BenchInspection[]): TeardownPlan {
  return teardownPlanner(assemblies)(inspections);
}

/**
 * {@link teardownPlan} for many units of one family: the assemblies are checked (and read) once,
 * and the function returned plans any set of inspections in them.
 */
export function teardownPlanner(assemblies: Assembly[]): (inspections: BenchInspection[]) => TeardownPlan {
  const { root, children, byId } = checkAssemblies(assemblies);
  return (inspections) => {
    checkInspections(inspections, byId);
    const own = new Map<string, Block[]>([...byId.keys()].map((id) => [id, []]));
    for (const x of inspections) own.get(x.assemblyId)!.push({ p: x.probability, c: x.minutes, causes: [x.causeId] });

    const chainOf = (id: string): Block[] => {
      const parts = [...own.get(id)!.map((b) => [b]), ...children.get(id)!.map(chainOf)];
      const merged = mergeChains(parts);
      // An assembly with nothing to inspect inside it is never opened.
      return merged.length === 0 ? [] : prependOpening(byId.get(id)!.openMinutes, merged);
    };
    return stepsFor(chainOf(root).flatMap((b) => b.causes), byId, inspections);
  };
}

/**
 * The steps and expected minutes of inspecting in a given order (say, the flat p/c order that
 * ignores assemblies), each assembly opened just before the first inspection that needs it.
 */
export function teardownPlanInOrder(assemblies: Assembly[], inspections: BenchInspection[], order: string[]): TeardownPlan {
  const { byId } = checkAssemblies(assemblies);
  checkInspections(inspections, byId);
  if (!Array.isArray(order) || order.length !== inspections.length || new Set(order).size !== order.length) {
    throw new DiagnosisError("bad_number", "The order must name every inspection exactly once");
  }
  return stepsFor(order, byId, inspections);
}

/** Σ reach × minutes, with reach = 1 − Σ of the probabilities before (Heckerman, Breese & Rommelse 1995). */
function stepsFor(order: string[], byId: Map<string, Assembly>, inspections: BenchInspection[]): TeardownPlan {
  const byCause = new Map(inspections.map((x) => [x.causeId, x]));
  const open = new Set<string>();
  const steps: TeardownStep[] = [];
  let found = 0;
  let expectedMinutes = 0;
  for (const causeId of order) {
    const x = byCause.get(causeId);
    if (!x) throw new DiagnosisError("unknown_node", `No inspection for cause ${JSON.stringify(causeId)}`);
    const opens: string[] = [];
    for (let a: Assembly | undefined = byId.get(x.assemblyId); a && !open.has(a.id); a = a.parent === null ? undefined : byId.get(a.parent)) {
      opens.unshift(a.id);
    }
    for (const id of opens) open.add(id);
    const minutes = x.minutes + opens.reduce((s, id) => s + byId.get(id)!.openMinutes, 0);
    const reachProbability = Math.max(0, 1 - found);
    steps.push({ causeId, opens, minutes, reachProbability });
    expectedMinutes += reachProbability * minutes;
    found += x.probability;
  }
  return { order: [...order], expectedMinutes, steps };
}
