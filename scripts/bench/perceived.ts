// What a person feels, in headless Chromium against the production build (`npm run bench perceived`):
//  - triage: a number key pressed on a case of the generated 300-node tree with 30 answers recorded,
//    until the server's new ranking is painted (the step stored and its ranking shown). Beside it, in the same run and interleaved, the floor:
//    a key that only makes a round trip behind the same session check (GET /api/session) and paints
//    its answer. Measured alone, then under load.
//  - "Under load" is a shop of 50 technicians on the phone (BENCH_LOAD_WALKERS), each answering
//    through the screen's server action and thinking 30 to 45 s before each answer
//    (BENCH_LOAD_THINK_MS, "min-max"), as a technician with a caller does; their first answers are
//    spread over the first 45 s, and measuring starts once all of them are under way. The budget
//    applies to that. For information the same is measured at ten times the pace, 3 to 4.5 s of
//    thought (BENCH_STRESS_THINK_MS): a stress figure, no budget.
//  - search: each keystroke typed into the write-up search at BENCH_WRITEUPS (10,000) write-ups,
//    until the results for what has been typed are painted. Beside it, word by word in the same run,
//    the floor: the same keys typed into a plain input added to the page, whose input event writes
//    its value into the page (no React, no search).
// BENCH_ONLY=search runs only the search measurement (the triage parts take several minutes);
// BENCH_ONLY=answer only the triage measurement alone, without the load runs.
// Budgets on a 2-core machine: answer p95 ≤ 50 ms alone and ≤ 150 ms under load; search p95 ≤ 50 ms.
import os from "node:os";
import { eq } from "drizzle-orm";
import { chromium, type Page } from "playwright-core";
import { db, sql } from "@/db";
import { users } from "@/db/schema";
import { auditSteps, parseThinkTime, runLoad, type ThinkTime } from "../load/walkers";
import { setUpGeneratedCase, STEPS } from "./support/generated-case";
import { COUNT, generateWriteups, removeGenerated, WORDS } from "./support/writeups";

const BASE = process.env.BENCH_BASE_URL ?? "http://127.0.0.1:3200";
const SAMPLES = Number(process.env.BENCH_SAMPLES ?? 40);
const LOAD_WALKERS = Number(process.env.BENCH_LOAD_WALKERS ?? 50);
const SHOP_THINK = parseThinkTime(process.env.BENCH_LOAD_THINK_MS, { min: 30_000, max: 45_000 });
const STRESS_THINK = parseThinkTime(process.env.BENCH_STRESS_THINK_MS, { min: 3_000, max: 4_500 });
const ONLY = process.env.BENCH_ONLY;
if (ONLY !== undefined && ONLY !== "search" && ONLY !== "answer") throw new Error(`BENCH_ONLY=${ONLY}: only "search" and "answer" are known`);

/**
 * Installed in the page: times from a key's keydown to the frame after `done()` first holds,
 * checked on every DOM change (a requestAnimationFrame then a task: the frame has been painted).
 */
const PAGE_HELPERS = `
// tsx compiles this file with esbuild's keepNames, whose __name helper the page does not have.
globalThis.__name = (f) => f;
// Armed first, awaited after the key is pressed: window.__rbArm(...); press; await window.__rbPending.
window.__rbArm = (key, done) => { window.__rbPending = window.__rbTime(key, done); window.__rbPending.catch(() => {}); };
window.__rbTime = (key, done) => new Promise((resolve, reject) => {
  let t0 = 0;
  const check = () => {
    if (!t0) return;
    if (done()) {
      observer.disconnect();
      requestAnimationFrame(() => setTimeout(() => resolve({ total: performance.now() - t0 }), 0));
    }
  };
  const observer = new MutationObserver(check);
  observer.observe(document.body, { subtree: true, childList: true, attributes: true, characterData: true });
  window.addEventListener("keydown", (e) => { if (e.key === key) t0 = e.timeStamp || performance.now(); }, { capture: true, once: true });
  setTimeout(() => { observer.disconnect(); reject(new Error("nothing painted within 10 s after " + key)); }, 10000);
});
// The floor: F8 makes a round trip behind the session check and paints its answer.
window.addEventListener("keydown", async (e) => {
  if (e.key !== "F8") return;
  const r = await fetch("/api/session", { headers: { accept: "application/json" } });
  await r.json();
  let out = document.getElementById("rb-floor");
  if (!out) { out = document.createElement("output"); out.id = "rb-floor"; document.body.append(out); }
  out.textContent = String(Number(out.textContent || 0) + 1);
});
`;

type Timing = { total: number };
type Arm = (key: string, done: () => boolean) => void;
const pending = (page: Page) => page.evaluate(() => (window as unknown as { __rbPending: Promise<Timing> }).__rbPending);

async function timeAnswer(page: Page): Promise<Timing> {
  const n = STEPS + 1;
  // The walk follows the suggestions, so the technician picks the best suggested question first (not timed).
  if (!(await page.getByTestId("current-question").count())) await page.getByTestId("suggestion").first().click();
  await page.getByTestId("current-question").waitFor();
  await page.evaluate((n) => (window as unknown as { __rbArm: Arm }).__rbArm("1",
    () => document.querySelector(`[data-testid=trail-step][data-seq="${n}"]`) !== null
      && document.querySelector("[data-testid=walk-screen]")?.getAttribute("data-pending") === "no"), n);
  await page.keyboard.press("1");
  const result = await pending(page);
  // Back to 30 answers for the next sample (not timed).
  await page.keyboard.press("u");
  await page.locator(`[data-testid=trail-step][data-seq="${n}"]`).waitFor({ state: "detached" });
  await page.locator("[data-testid=walk-screen][data-pending=no]").waitFor();
  return result;
}

async function timeFloor(page: Page): Promise<Timing> {
  const before = await page.evaluate(() => Number(document.getElementById("rb-floor")?.textContent ?? 0));
  await page.evaluate((before) => (window as unknown as { __rbArm: Arm }).__rbArm("F8",
    () => Number(document.getElementById("rb-floor")?.textContent ?? 0) > before), before);
  await page.keyboard.press("F8");
  return pending(page);
}

async function measureTriage(page: Page, samples: number) {
  const answer: Timing[] = [];
  const floor: Timing[] = [];
  for (let i = 0; i < samples; i++) {
    // Interleaved, so both see the same machine load; a pause as between a technician's keypresses.
    answer.push(await timeAnswer(page));
    await page.waitForTimeout(50);
    floor.push(await timeFloor(page));
    await page.waitForTimeout(50);
  }
  return { answer, floor };
}

/**
 * Types `word` key by key into the search box, or into the floor's plain input, each key timed until
 * what has been typed is painted: the search's results for it, or the plain input's echo of it.
 */
async function typeTimed(page: Page, into: "search" | "plain", word: string, times: number[]) {
  const input = page.locator(into === "search" ? "#writeup-search" : "#rb-plain");
  await input.fill("");
  if (into === "search") await page.getByTestId("search-status").filter({ hasText: "newest first" }).waitFor();
  await input.focus();
  for (let k = 1; k <= word.length; k++) {
    const typed = word.slice(0, k);
    await page.evaluate(([into, typed]) => (window as unknown as { __rbArm: Arm }).__rbArm(typed.at(-1)!, into === "search"
      ? () => (document.querySelector("[data-testid=search-status]")?.textContent ?? "").includes(`for “${typed}”`)
      : () => document.getElementById("rb-plain-echo")?.textContent === typed), [into, typed] as const);
    await page.keyboard.press(typed.at(-1)!);
    times.push((await pending(page)).total);
    await page.waitForTimeout(60); // a typist's pace, roughly 150 ms a key with the measuring
  }
}

async function measureSearch(page: Page): Promise<{ search: number[]; floor: number[] }> {
  await page.goto(`${BASE}/writeups`);
  await page.getByTestId("search-status").filter({ hasText: new RegExp(`of ${COUNT >= 1000 ? "\\d{4,}" : "\\d+"} write-ups`) }).waitFor({ timeout: 180_000 });
  // The floor's plain input, outside React: its input event writes the value into the page.
  await page.evaluate(() => {
    const plain = document.createElement("input");
    plain.id = "rb-plain";
    const echo = document.createElement("output");
    echo.id = "rb-plain-echo";
    plain.addEventListener("input", () => { echo.textContent = plain.value; });
    document.body.append(plain, echo);
  });
  const search: number[] = [];
  const floor: number[] = [];
  for (const word of WORDS.slice(0, 12)) {
    await typeTimed(page, "search", word, search);
    await typeTimed(page, "plain", word, floor);
  }
  return { search, floor };
}

/** The triage measurement while LOAD_WALKERS technicians answer in the background with this think time. */
async function measureUnderLoad(page: Page, userId: string, thinkMs: ThinkTime) {
  const stop = { at: Date.now() + 3_600_000 };
  const load = runLoad({ baseUrl: BASE, walkers: LOAD_WALKERS, seconds: 3600, userId, stop, thinkMs });
  await page.waitForTimeout(thinkMs.max + 2000); // every walker has started answering
  const measured = await measureTriage(page, SAMPLES).finally(() => { stop.at = 0; });
  const background = await load;
  return { ...measured, background, audit: await auditSteps(background) };
}

const seconds = (ms: number) => `${(ms / 1000).toFixed(ms % 1000 ? 1 : 0)}`;

const quantile = (values: number[], q: number) => {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
};
const row = (label: string, values: number[], budget?: number) => {
  const p95 = quantile(values, 0.95);
  const verdict = budget === undefined ? "" : p95 <= budget ? `  within ${budget} ms` : `  OVER ${budget} ms`;
  return `${label.padEnd(44)}${quantile(values, 0.5).toFixed(1).padStart(8)}${p95.toFixed(1).padStart(9)}${String(values.length).padStart(6)}${verdict}`;
};

/** The triage measurements, alone and under load, and their table. */
async function measureAllTriage(page: Page, caseId: number, techId: string) {
  await page.goto(`${BASE}/triage/${caseId}`);
  await page.locator(`[data-testid=trail-step][data-seq="${STEPS}"]`).waitFor();
  await measureTriage(page, 5); // warm-up: the server's and the browser's first runs
  const alone = await measureTriage(page, SAMPLES);
  const load = os.loadavg().map((l) => l.toFixed(2)).join(" ");

  console.log(`\nperceived speed, Chromium against the production build; ${STEPS} answers recorded on a 300-node tree; ${SAMPLES} samples each; load average ${load}`);
  console.log(`${"".padEnd(44)}${"median".padStart(8)}${"p95".padStart(9)}${"n".padStart(6)}   (ms, keydown to the frame painted)`);
  console.log(row("answer: server's ranking painted", alone.answer.map((t) => t.total), 50));
  console.log(row("floor: no-op round trip, same session check", alone.floor.map((t) => t.total)));
  if (ONLY === "answer") return;

  const shop = await measureUnderLoad(page, techId, SHOP_THINK);
  const stress = await measureUnderLoad(page, techId, STRESS_THINK);

  const loadRows = (name: string, think: ThinkTime, run: typeof shop, budget?: number) => {
    console.log(`${name}: ${LOAD_WALKERS} technicians each thinking ${seconds(think.min)}–${seconds(think.max)} s before an answer`);
    console.log(row(`  server's ranking painted`, run.answer.map((t) => t.total), budget));
    console.log(row(`  floor`, run.floor.map((t) => t.total)));
    console.log(`    background: ${run.background.ok} answers stored (${run.background.failed} failed ${JSON.stringify(run.background.errors)}), ` +
      `median ${quantile(run.background.latenciesMs, 0.5).toFixed(1)} ms, p95 ${quantile(run.background.latenciesMs, 0.95).toFixed(1)} ms; steps missing ${run.audit.missing}`);
  };
  loadRows("under load, a shop", SHOP_THINK, shop, 150);
  loadRows("stress, ten times a shop's pace (no budget)", STRESS_THINK, stress);
}

async function main() {
  if (!process.env.DATABASE_URL || process.env.DATABASE_URL.includes(":54329/")) {
    throw new Error("Set DATABASE_URL to a bench database (npm run bench perceived does); refusing to fill the app database.");
  }
  const { token, caseId } = await setUpGeneratedCase();
  const [tech] = await db.select({ id: users.id }).from(users).where(eq(users.role, "tech")).limit(1);
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", headless: true,
    args: ["--headless", "--disable-gpu", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-sandbox"],
  });
  try {
    const context = await browser.newContext({ viewport: { width: 1360, height: 900 } });
    await context.addCookies([{ name: "rb_session", value: token, url: BASE }]);
    await context.addInitScript({ content: PAGE_HELPERS });
    const page = await context.newPage();
    if (ONLY !== "search") await measureAllTriage(page, caseId, tech.id);
    if (ONLY === "answer") return;

    await generateWriteups();
    const search = await measureSearch(page);
    const load = os.loadavg().map((l) => l.toFixed(2)).join(" ");
    console.log(`\nwrite-up search, Chromium against the production build; load average ${load} (1, 5, 15 min)`);
    console.log(`${"".padEnd(44)}${"median".padStart(8)}${"p95".padStart(9)}${"n".padStart(6)}   (ms, keydown to the frame painted)`);
    console.log(row(`search: keystroke to results painted (${COUNT} write-ups)`, search.search, 50));
    console.log(row("floor: keystroke into a plain input, echoed", search.floor));
  } finally {
    await browser.close();
    await removeGenerated();
    await sql.end({ timeout: 5 });
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
