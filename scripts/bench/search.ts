// Write-up search in Chromium: `npm run bench search` (DATABASE_URL = the bench DB, BENCH_BASE_URL =
// a production server on it). Generates BENCH_WRITEUPS (default 10,000) published write-ups, signs
// in, measures the index download and the time to a searchable index, then times 200 typed queries
// with the app's search (lib/search/writeup-index.ts: MiniSearch's own search) next to a plain
// Array.filter substring scan in the same page. What a person feels while typing (keystroke to
// results painted) is measured by `npm run bench perceived`. The generated rows are deleted afterwards.
import path from "node:path";
import { build } from "esbuild";
import { chromium } from "playwright-core";
import { sql as pg } from "../../db";
import { COUNT, generateWriteups, removeGenerated, WORDS } from "./support/writeups";

const BASE = process.env.BENCH_BASE_URL ?? "http://127.0.0.1:3200";
const ROOT = path.resolve(__dirname, "../..");


/** The app's own search code (lib/search/writeup-index.ts with MiniSearch), bundled for the page. */
async function searchBundle(): Promise<string> {
  const out = await build({
    stdin: {
      contents: `import { WriteupIndex } from "./lib/search/writeup-index"; Object.assign(globalThis, { RootbenchSearch: { WriteupIndex } });`,
      resolveDir: ROOT, loader: "ts",
    },
    bundle: true, format: "iife", platform: "browser", write: false, minify: true, target: "es2022",
  });
  return out.outputFiles[0].text;
}

/** 200 typed queries: each word as it is typed, every prefix from three letters on. */
function typedQueries(): string[] {
  return WORDS.flatMap((word) => Array.from({ length: word.length - 2 }, (_, n) => word.slice(0, n + 3))).slice(0, 200);
}

interface PageFigures {
  downloadMs: number; transferBytes: number; decodedBytes: number; parseMs: number; loadMs: number; buildMs: number; docs: number;
  mini: number[]; scan: number[]; scanLowered: number[]; miniHits: number; scanHits: number;
}

async function measure(): Promise<{ figures: PageFigures; pageReadyMs: number; pageReadyAgainMs: number }> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", headless: true,
    args: ["--headless", "--disable-gpu", "--no-first-run", "--disable-background-networking", "--no-sandbox"],
  });
  try {
    const context = await browser.newContext({ viewport: { width: 1360, height: 900 } });
    const page = await context.newPage();
    await page.goto(`${BASE}/sign-in`);
    await page.getByLabel("E-mail address").fill("trainee@rootbench.test");
    await page.getByLabel("Password").fill("bench-demo-2026");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.getByTestId("home-trainee").waitFor({ timeout: 30000 });

    // The write-up page as a trainee meets it: from navigation to an index ready for typing.
    const t0 = Date.now();
    await page.goto(`${BASE}/writeups`);
    await page.getByTestId("search-status").filter({ hasText: /of \d+ write-ups/ }).waitFor({ timeout: 120000 });
    const pageReadyMs = Date.now() - t0;
    // Again, as the next visit meets it: the server has the body ready and the browser revalidates its copy.
    const t1 = Date.now();
    await page.goto(`${BASE}/writeups`);
    await page.getByTestId("search-status").filter({ hasText: /of \d+ write-ups/ }).waitFor({ timeout: 120000 });
    const pageReadyAgainMs = Date.now() - t1;

    // tsx compiles this file with esbuild's keepNames, whose __name helper the page does not have.
    await page.addScriptTag({ content: `globalThis.__name = (f) => f;\n${await searchBundle()}` });
    const figures = await page.evaluate(async (queries: string[]): Promise<PageFigures> => {
      type Doc = { id: number; title: string; summary: string; text: string; causes: string[]; parts: string[]; families: string[]; tags: string[] };
      type Index = { search(q: string): unknown[] };
      const api = (globalThis as unknown as { RootbenchSearch: {
        WriteupIndex: new (docs: Doc[], serialized?: unknown) => Index;
      } }).RootbenchSearch;
      const t0 = performance.now();
      const response = await fetch(`/api/writeups/index?bench=${Date.now()}`, { cache: "no-store" });
      const raw = await response.text();
      const downloadMs = performance.now() - t0;
      const entry = performance.getEntriesByType("resource").filter((e) => e.name.includes("/api/writeups/index?bench=")).pop() as PerformanceResourceTiming | undefined;
      const t1 = performance.now();
      const payload = JSON.parse(raw) as { docs: Doc[]; index: unknown };
      const parseMs = performance.now() - t1;
      // What the page does: load the index the server built. Building it here from the documents, for comparison.
      const t2 = performance.now();
      const index = new api.WriteupIndex(payload.docs, payload.index);
      const loadMs = performance.now() - t2;
      const t3 = performance.now();
      new api.WriteupIndex(payload.docs);
      const buildMs = performance.now() - t3;
      // The plain scan: every field of every write-up, lower-cased and searched for the typed text.
      const has = (text: string, q: string) => text.toLowerCase().includes(q);
      const scanSearch = (q: string) => payload.docs.filter((d) => has(d.title, q) || has(d.summary, q) || has(d.text, q)
        || d.causes.some((c) => has(c, q)) || d.parts.some((c) => has(c, q)) || d.families.some((c) => has(c, q)) || d.tags.some((c) => has(c, q)));
      // A stricter baseline: the same scan over text lower-cased once in advance.
      const haystacks = payload.docs.map((d) => [d.title, d.summary, d.text, ...d.causes, ...d.parts, ...d.families, ...d.tags].join(" ").toLowerCase());
      const lowered = (q: string) => payload.docs.filter((_, i) => haystacks[i].includes(q));
      const REPEAT = 5;
      const time = (run: () => unknown) => {
        const start = performance.now();
        for (let r = 0; r < REPEAT; r++) run();
        return (performance.now() - start) / REPEAT;
      };
      for (const q of queries.slice(0, 20)) { index.search(q); scanSearch(q); lowered(q); }
      const mini: number[] = [], scan: number[] = [], scanLowered: number[] = [];
      let miniHits = 0, scanHits = 0;
      for (const q of queries) {
        mini.push(time(() => index.search(q)));
        scan.push(time(() => scanSearch(q)));
        scanLowered.push(time(() => lowered(q)));
        miniHits += index.search(q).length;
        scanHits += scanSearch(q).length;
      }
      return {
        downloadMs, transferBytes: entry?.encodedBodySize ?? 0, decodedBytes: entry?.decodedBodySize ?? raw.length,
        parseMs, loadMs, buildMs, docs: payload.docs.length, mini, scan, scanLowered, miniHits, scanHits,
      };
    }, typedQueries());
    return { figures, pageReadyMs, pageReadyAgainMs };
  } finally {
    await browser.close();
  }
}

const quantile = (values: number[], q: number) => {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
};
const ms = (v: number) => `${v.toFixed(2)} ms`;
const mb = (v: number) => `${(v / 1_000_000).toFixed(2)} MB`;

async function main() {
  // Never generate thousands of rows into the shared app database by accident.
  if (COUNT > 0 && (!process.env.DATABASE_URL || process.env.DATABASE_URL.includes(":54329/"))) {
    throw new Error("Set DATABASE_URL to a bench database (npm run bench search does); refusing to fill the app database.");
  }
  try {
    await removeGenerated();
    if (COUNT > 0) await generateWriteups();
    const { figures: f, pageReadyMs, pageReadyAgainMs } = await measure();
    const miniMedian = quantile(f.mini, 0.5), scanMedian = quantile(f.scan, 0.5);
    const miniP95 = quantile(f.mini, 0.95), scanP95 = quantile(f.scan, 0.95);
    console.log(`\nwrite-up search, ${f.docs} published write-ups, ${f.mini.length} typed queries (each timed as the mean of 5 runs)`);
    console.log(`index download      ${mb(f.transferBytes)} on the wire (${mb(f.decodedBytes)} JSON), ${ms(f.downloadMs)}`);
    console.log(`parse + load        ${ms(f.parseMs)} JSON.parse, ${ms(f.loadMs)} loading the server-built index (building it from the documents instead: ${ms(f.buildMs)})`);
    console.log(`page to searchable  ${pageReadyMs} ms (navigation to /writeups until the index answers; the server builds the index body first)`);
    console.log(`  next visit        ${pageReadyAgainMs} ms (the server's body is ready, the browser's copy revalidated)`);
    console.log(`                    median      p95         results`);
    console.log(`WriteupIndex        ${ms(miniMedian).padEnd(12)}${ms(miniP95).padEnd(12)}${f.miniHits}`);
    const lowMedian = quantile(f.scanLowered, 0.5), lowP95 = quantile(f.scanLowered, 0.95);
    console.log(`Array.filter scan   ${ms(scanMedian).padEnd(12)}${ms(scanP95).padEnd(12)}${f.scanHits}`);
    console.log(`  pre-lowered text  ${ms(lowMedian).padEnd(12)}${ms(lowP95).padEnd(12)}${f.scanHits}`);
    console.log(`(the index returns the 50 best of its matches, ranked; the scan returns every match, unranked)`);
  } finally {
    await removeGenerated();
    await pg.end();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
