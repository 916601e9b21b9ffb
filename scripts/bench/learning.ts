// How much learning from closed cases helps triage, on a seeded simulation: `npm run bench learning`
// (needs no database or server). For each kind of tree, random trees and a history of past cases
// drawn from a hidden true table; 500 fresh cases per tree scored with four likelihood tables.
import { DEFAULT_LEARNING_STRENGTH, learnLikelihoods, scoreCauses, type ClosedCase, type DxSettings } from "@/lib/diagnosis";
import { drawCases, makeWorld, ANSWER_NOISE, DONT_KNOW_RATE, type World, type Wrongness } from "./support/learning-world";

const TREES = Number(process.env.LEARNING_TREES ?? 40);
const HISTORY_SIZES = [100, 300, 1000];
const FRESH_CASES = 500;
const KINDS: Wrongness[] = ["right", "a little wrong", "badly wrong"];
const METHODS = ["authored", `learned m=${DEFAULT_LEARNING_STRENGTH}`, "learned from data", "true table"] as const;
type Method = (typeof METHODS)[number];

interface Tally {
  hits: number[];
  loss: number[];
}

function score(world: World, cases: ClosedCase[], likelihoods: DxSettings["likelihoods"], into: Tally): void {
  for (const c of cases) {
    const { causes } = scoreCauses(world.tree, c.answers, { unlistedShare: 0, likelihoods });
    into.hits.push(causes[0].causeId === c.confirmedCauseId ? 1 : 0);
    into.loss.push(-Math.log(causes.find((x) => x.causeId === c.confirmedCauseId)!.probability));
  }
}

const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
/** Standard error of the mean of paired differences a − b. */
const pairedSe = (a: number[], b: number[]) => {
  const d = a.map((x, i) => x - b[i]);
  const m = mean(d);
  return Math.sqrt(d.reduce((s, x) => s + (x - m) ** 2, 0) / (d.length - 1) / d.length);
};
const pct = (x: number) => (100 * x).toFixed(1).padStart(5);
const pts = (x: number) => `${x >= 0 ? "+" : ""}${(100 * x).toFixed(2)}`;

console.log(`${TREES} trees per kind (3–5 answers, 6–15 causes), answer noise ${ANSWER_NOISE}, don't-know ${DONT_KNOW_RATE}, ${FRESH_CASES} fresh cases per tree, unlisted share 0`);
const started = Date.now();
for (const kind of KINDS) {
  console.log(`\n${kind}`);
  console.log(`${"past cases".padEnd(11)}${METHODS.map((m) => m.padStart(20)).join("")}   learned from data − authored (top-1 pts ± SE)   share of the gap to the true table recovered (top-1, log loss)`);
  for (const size of HISTORY_SIZES) {
    const tallies = Object.fromEntries(METHODS.map((m) => [m, { hits: [], loss: [] } as Tally])) as Record<Method, Tally>;
    for (let t = 0; t < TREES; t++) {
      const seed = 1000 * (KINDS.indexOf(kind) + 1) + t;
      const world = makeWorld(seed, kind);
      const history = drawCases(world, size, seed * 7 + 1);
      const fresh = drawCases(world, FRESH_CASES, seed * 7 + 2);
      score(world, fresh, undefined, tallies.authored);
      score(world, fresh, learnLikelihoods(world.tree, history, DEFAULT_LEARNING_STRENGTH).likelihoods, tallies[`learned m=${DEFAULT_LEARNING_STRENGTH}`]);
      score(world, fresh, learnLikelihoods(world.tree, history).likelihoods, tallies["learned from data"]);
      score(world, fresh, world.truth, tallies["true table"]);
    }
    const a = tallies.authored;
    const d = tallies["learned from data"];
    const truth = tallies["true table"];
    const cells = METHODS.map((m) => `${pct(mean(tallies[m].hits))}% ${mean(tallies[m].loss).toFixed(3)}`.padStart(20)).join("");
    const gapTop = mean(truth.hits) - mean(a.hits);
    const gapLoss = mean(a.loss) - mean(truth.loss);
    const share = (x: number, gap: number) => (Math.abs(gap) < 1e-3 ? "  —  " : `${(100 * x / gap).toFixed(0).padStart(4)}%`);
    console.log(
      `${String(size).padEnd(11)}${cells}   ${pts(mean(d.hits) - mean(a.hits)).padStart(6)} ± ${(100 * pairedSe(d.hits, a.hits)).toFixed(2)}` +
        `${"".padEnd(30)}${share(mean(d.hits) - mean(a.hits), gapTop)}, ${share(mean(a.loss) - mean(d.loss), gapLoss)}`,
    );
  }
}
console.log(`\n(top-1 % and mean log loss, natural log; ${((Date.now() - started) / 1000).toFixed(1)} s)`);
