// Write-up search in Chromium: `npm run bench search` (DATABASE_URL = the bench DB, BENCH_BASE_URL =
// a production server on it). Generates BENCH_WRITEUPS (default 10,000) published write-ups, signs
// in, measures the index download and the time to a searchable index, then times 200 typed queries
// with the app's index (MiniSearch's, ranked by lib/search/top-hits.ts) against a plain Array.filter
// substring scan in the same page, and MiniSearch's own search on the same index.
// The generated rows are deleted afterwards.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { build } from "esbuild";
import { chromium } from "playwright-core";
import { like } from "drizzle-orm";
import { db, sql as pg } from "../../db";
import { writeupCauses, writeupFamilies, writeupParts, writeups } from "../../db/schema";
import { parseWriteup } from "../../db/seed/content";
import { prng } from "@/lib/random";

const BASE = process.env.BENCH_BASE_URL ?? "http://127.0.0.1:3200";
const COUNT = Number(process.env.BENCH_WRITEUPS ?? 10_000);
const PREFIX = "bench-gen-";
const ROOT = path.resolve(__dirname, "../..");


// The generated corpus is recombined from the demo write-ups' own sentences, headings, titles and
// tags, so its words occur about as often as in the shop's real writing.
interface Pools { titles: string[]; summaries: string[]; headings: string[]; sentences: string[]; tags: string[] }

function demoPools(): Pools {
  const dir = path.join(ROOT, "content/writeups");
  const pools: Pools = { titles: [], summaries: [], headings: [], sentences: [], tags: [] };
  for (const file of readdirSync(dir).filter((f) => f.endsWith(".md"))) {
    const w = parseWriteup(file.replace(/\.md$/, ""), readFileSync(path.join(dir, file), "utf8"));
    pools.titles.push(w.title.includes(": ") ? w.title.split(": ").slice(1).join(": ") : w.title);
    pools.summaries.push(w.summary);
    pools.tags.push(...w.tags);
    for (const line of w.body.split("\n").map((l) => l.trim())) {
      if (/^#{2,3} /.test(line)) pools.headings.push(line.replace(/^#+ /, ""));
      else if (line && !/^(\||!\[|```|>)/.test(line)) pools.sentences.push(...line.replace(/^([-*]|\d+\.) /, "").split(/(?<=[.!?])\s+/).filter((x) => x.length > 20));
    }
  }
  return pools;
}

// Typed in the benchmark: words a trainee would look for, as every prefix from three letters on.
const WORDS = ["bearing", "clutch", "sprag", "corrosion", "controller", "water", "belt", "torque", "sensor", "grease", "seal", "pedal", "crank", "needle", "gear", "washer", "magnet", "cadence", "connector", "tensioner", "housing", "gasket", "rollers", "membrane", "firmware", "cage", "shaft", "spider", "lockring", "winter",
  "pressure", "display", "cable", "pulley", "rotor", "battery", "vent", "bolts", "salt", "rust", "flank", "depth", "press", "thread",
  "speed", "stethoscope", "calibration", "commuter", "cargo", "trail", "crack", "whine", "grinding"];

interface Catalogue { families: { id: number; label: string }[]; causes: { id: number; name: string }[]; parts: { id: number }[]; userId: string | null }

function generate(i: number, random: () => number, cat: Catalogue, pools: Pools) {
  const pick = <T,>(items: T[]) => items[Math.floor(random() * items.length)];
  const sentences = (n: number) => Array.from({ length: n }, () => pick(pools.sentences)).join(" ");
  const family = pick(cat.families);
  const sections = Array.from({ length: 4 + Math.floor(random() * 2) }, (_, k) =>
    k === 2
      ? [`## ${pick(pools.headings)}`, "", ...Array.from({ length: 3 }, () => `- ${pick(pools.sentences)}`)].join("\n")
      : [`## ${pick(pools.headings)}`, "", sentences(2 + Math.floor(random() * 3))].join("\n"));
  return {
    row: {
      slug: `${PREFIX}${i}`, title: `${family.label}: ${pick(pools.titles)}`, summary: pick(pools.summaries),
      body: sections.join("\n\n"), tags: [...new Set([pick(pools.tags), pick(pools.tags)])],
    },
    familyId: family.id, causeId: pick(cat.causes).id, partId: pick(cat.parts).id,
  };
}

async function generateWriteups(): Promise<void> {
  const families = await pg<{ id: number; label: string }[]>`select id, name || ' ' || generation as label from motor_families`;
  const causes = await pg<{ id: number; name: string }[]>`select id, name from causes`;
  const parts = await pg<{ id: number }[]>`select id from parts`;
  const [author] = await pg<{ id: string }[]>`select id from users where role = 'senior' limit 1`;
  const cat: Catalogue = { families, causes, parts, userId: author?.id ?? null };
  const pools = demoPools();
  const random = prng(20260101);
  const started = Date.now();
  for (let from = 0; from < COUNT; from += 1000) {
    const batch = Array.from({ length: Math.min(1000, COUNT - from) }, (_, k) => generate(from + k, random, cat, pools));
    const at = new Date();
    const ids = await db
      .insert(writeups)
      .values(batch.map((b) => ({ ...b.row, status: "published" as const, authorId: cat.userId, publishedAt: at, publishedBy: cat.userId, updatedAt: at })))
      .returning({ id: writeups.id });
    await db.insert(writeupFamilies).values(batch.map((b, k) => ({ writeupId: ids[k].id, familyId: b.familyId })));
    await db.insert(writeupCauses).values(batch.map((b, k) => ({ writeupId: ids[k].id, causeId: b.causeId })));
    await db.insert(writeupParts).values(batch.map((b, k) => ({ writeupId: ids[k].id, partId: b.partId })));
  }
  console.log(`generated ${COUNT} write-ups in ${Date.now() - started} ms`);
}

/** The app's own search code (lib/search/writeup-index.ts with MiniSearch), bundled for the page. */
async function searchBundle(): Promise<string> {
  const out = await build({
    stdin: {
      contents: `import MiniSearch from "minisearch"; import { MINI_OPTIONS, WriteupIndex } from "./lib/search/writeup-index"; Object.assign(globalThis, { RootbenchSearch: { WriteupIndex, MiniSearch, MINI_OPTIONS } });`,
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
  mini: number[]; plain: number[]; scan: number[]; scanLowered: number[]; miniHits: number; scanHits: number;
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
      type Plain = { search(q: string, options: object): unknown[] };
      const api = (globalThis as unknown as { RootbenchSearch: {
        WriteupIndex: new (docs: Doc[], serialized?: unknown) => Index;
        MiniSearch: { loadJS(index: unknown, options: unknown): Plain }; MINI_OPTIONS: unknown;
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
      // MiniSearch's own search on the same index, every match made into a result and sorted (what TopHits replaces).
      const plainIndex = api.MiniSearch.loadJS(payload.index, api.MINI_OPTIONS);
      const plainSearch = (q: string) => plainIndex.search(q, { combineWith: "AND", fuzzy: false });
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
      for (const q of queries.slice(0, 20)) { index.search(q); plainSearch(q); scanSearch(q); lowered(q); }
      const mini: number[] = [], plain: number[] = [], scan: number[] = [], scanLowered: number[] = [];
      let miniHits = 0, scanHits = 0;
      for (const q of queries) {
        mini.push(time(() => index.search(q)));
        plain.push(time(() => plainSearch(q)));
        scan.push(time(() => scanSearch(q)));
        scanLowered.push(time(() => lowered(q)));
        miniHits += index.search(q).length;
        scanHits += scanSearch(q).length;
      }
      return {
        downloadMs, transferBytes: entry?.encodedBodySize ?? 0, decodedBytes: entry?.decodedBodySize ?? raw.length,
        parseMs, loadMs, buildMs, docs: payload.docs.length, mini, plain, scan, scanLowered, miniHits, scanHits,
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
  const removeGenerated = () => db.delete(writeups).where(like(writeups.slug, `${PREFIX}%`));
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
    console.log(`index (TopHits)     ${ms(miniMedian).padEnd(12)}${ms(miniP95).padEnd(12)}${f.miniHits}`);
    console.log(`MiniSearch#search   ${ms(quantile(f.plain, 0.5)).padEnd(12)}${ms(quantile(f.plain, 0.95)).padEnd(12)}(same index and ranking, every match built and sorted; exact and prefix only)`);
    const lowMedian = quantile(f.scanLowered, 0.5), lowP95 = quantile(f.scanLowered, 0.95);
    console.log(`Array.filter scan   ${ms(scanMedian).padEnd(12)}${ms(scanP95).padEnd(12)}${f.scanHits}`);
    console.log(`  pre-lowered text  ${ms(lowMedian).padEnd(12)}${ms(lowP95).padEnd(12)}${f.scanHits}`);
    console.log(`ratio (scan/mini)   ${(scanMedian / miniMedian).toFixed(1)}× median, ${(scanP95 / miniP95).toFixed(1)}× p95; pre-lowered ${(lowMedian / miniMedian).toFixed(1)}× median`);
    console.log(`(the index keeps the 50 best of its matches, ranked; the scan returns every match, unranked)`);
    console.log(`targets             ≥ 10× faster: ${scanMedian / miniMedian >= 10 ? "met" : "missed"}; p95 < 15 ms: ${miniP95 < 15 ? "met" : "missed"}`);
  } finally {
    await removeGenerated();
    await pg.end();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
