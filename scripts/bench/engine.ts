// Timing of the diagnosis engine on generated trees: `npx tsx scripts/bench/engine.ts`.
// The trees are random but seeded, so every run measures the same work.
import { rankNextQuestions, scoreCauses, type DxAnswer, type DxNode, type DxOption, type DxTree, type Strength } from "../../lib/diagnosis";
import { prng } from "@/lib/random";

const SIZES = [300, 1000];
const CAUSES = 60;
const OPTIONS_PER_NODE = 3;
const ANSWERS = 25;
const EVIDENCE_PER_OPTION = 4;
const WARMUP_MS = 1500;
const MEASURE_MS = 6000;


const STRENGTHS: Strength[] = ["rules_out", "against", "for", "for", "strong", "against"];

/** `size` nodes: one cause node per cause at the end, questions and checks before, edges only forward. */
function generateTree(size: number, seed: number): DxTree {
  const random = prng(seed);
  const pick = <T>(items: T[]) => items[Math.floor(random() * items.length)];
  const causes = Array.from({ length: CAUSES }, (_, k) => ({ id: `cause-${k}`, priorWeight: 1 + Math.floor(random() * 9) }));
  const asking = size - CAUSES;
  const nodes: DxNode[] = [];
  const options: DxOption[] = [];
  for (let i = 0; i < asking; i++) {
    const check = random() < 0.3;
    nodes.push({ id: `n${i}`, kind: check ? "check" : "question", ...(check ? { costMinutes: 5 + Math.floor(random() * 26) } : {}) });
    for (let o = 0; o < OPTIONS_PER_NODE; o++) {
      const target = i + 1 + Math.floor(random() * Math.min(40, size - i - 1));
      const evidence: Record<string, Strength> = {};
      for (let e = 0; e < EVIDENCE_PER_OPTION; e++) evidence[pick(causes).id] = pick(STRENGTHS);
      options.push({ id: `n${i}-o${o}`, nodeId: `n${i}`, to: target < asking ? `n${target}` : `c${target - asking}`, label: `option ${o}`, evidence });
    }
  }
  causes.forEach((c, k) => nodes.push({ id: `c${k}`, kind: "cause", causeId: c.id }));
  return { rootId: "n0", nodes, options, causes };
}

/** Answers a technician might give for a hidden true cause: never an option that rules it out. */
function generateAnswers(tree: DxTree, seed: number): DxAnswer[] {
  const random = prng(seed);
  const truth = tree.causes[Math.floor(random() * tree.causes.length)].id;
  const answers: DxAnswer[] = [];
  while (answers.length < ANSWERS) {
    const ranked = rankNextQuestions(tree, answers, {});
    if (ranked.length === 0) break;
    const nodeId = ranked[Math.floor(random() * Math.min(5, ranked.length))].nodeId;
    const allowed = tree.options.filter((o) => o.nodeId === nodeId && o.evidence[truth] !== "rules_out");
    answers.push({ nodeId, optionId: allowed[Math.floor(random() * allowed.length)].id });
  }
  return answers;
}

function time(fn: () => unknown): { median: number; p95: number; runs: number } {
  const warmEnd = performance.now() + WARMUP_MS / 4;
  while (performance.now() < warmEnd) fn();
  const samples: number[] = [];
  const end = performance.now() + MEASURE_MS / 4;
  while (performance.now() < end) {
    const t0 = performance.now();
    fn();
    samples.push(performance.now() - t0);
  }
  samples.sort((a, b) => a - b);
  const at = (q: number) => samples[Math.min(samples.length - 1, Math.floor(q * samples.length))];
  return { median: at(0.5), p95: at(0.95), runs: samples.length };
}

const rows: string[][] = [["nodes", "causes", "answers", "function", "median ms", "p95 ms", "runs"]];
for (const size of SIZES) {
  const tree = generateTree(size, 20240 + size);
  const answers = generateAnswers(tree, 7 + size);
  for (const [name, fn] of [
    ["scoreCauses", () => scoreCauses(tree, answers)],
    ["rankNextQuestions", () => rankNextQuestions(tree, answers)],
  ] as const) {
    const { median, p95, runs } = time(fn);
    rows.push([String(size), String(CAUSES), String(answers.length), name, median.toFixed(3), p95.toFixed(3), String(runs)]);
  }
}

const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => r[c].length)));
const line = (r: string[]) => r.map((cell, c) => (c === 3 ? cell.padEnd(widths[c]) : cell.padStart(widths[c]))).join("  ");
console.log(`diagnosis engine, node ${process.version}, ${OPTIONS_PER_NODE} options per node`);
for (const r of rows) console.log(line(r));
