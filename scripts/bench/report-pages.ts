// The reports pages as the shop lead opens them (`npm run bench report-pages`): headless Chromium
// against the production build, signed in on the demo data. Each page is loaded BENCH_LOADS times
// (after warm-up loads), the pages taken in turn so that all see the same machine load. Two times
// from navigation start: the load event's end (Navigation Timing), and "shown": the later of that
// and the last mark added inside a chart (a chart drawn by script after the load event, as one that
// measures its container first is, would otherwise look done before the lead can see it). Beside
// them, in the same run and taken in the same turns, the floor: the signed-in account page (the same
// shell and session check, one small query). Budget: every reports page shown ≤ 300 ms at p95.
import { eq } from "drizzle-orm";
import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { chromium, type Page } from "playwright-core";
import { db, sql } from "@/db";
import { motorFamilies, users } from "@/db/schema";
import { createSession } from "@/lib/auth/session";

const BASE = process.env.BENCH_BASE_URL ?? "http://127.0.0.1:3200";
const LOADS = Number(process.env.BENCH_LOADS ?? 30);
const WARMUP = 3;
const BUDGET_MS = 300;
const FLOOR = "/account";

/** Every page under app/(shop)/reports, as its URL (a new reports page is measured without editing this file). */
function reportPages(): string[] {
  const root = path.join(process.cwd(), "app", "(shop)", "reports");
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const full = path.join(dir, name);
      if (statSync(full).isDirectory()) walk(full);
      else if (name === "page.tsx") found.push(`/reports${path.relative(root, dir) ? `/${path.relative(root, dir)}` : ""}`);
    }
  };
  walk(root);
  if (found.some((p) => p.includes("["))) throw new Error("A reports page with a dynamic segment needs a concrete URL here.");
  return found.sort();
}

/** In every page, before its own scripts: the time of the last node added inside a chart (an element with role img). */
function watchChartMarks() {
  const marks = window as unknown as { lastChartMark?: number };
  new MutationObserver((records) => {
    for (const record of records) {
      for (const node of record.addedNodes) {
        if (node instanceof Element && node.closest("[role=img]")) { marks.lastChartMark = performance.now(); return; }
      }
    }
  }).observe(document, { childList: true, subtree: true });
}

/** Long enough after the load event for a chart that waits on a measurement of its box to have drawn. */
const SETTLE_MS = 400;

async function loadTime(page: Page, url: string): Promise<{ load: number; shown: number }> {
  // Each load starts from a blank page, after a pause, so the last page's teardown is not in it.
  await page.goto("about:blank");
  await page.waitForTimeout(100);
  const response = await page.goto(`${BASE}${url}`, { waitUntil: "load" });
  if (!response?.ok() || new URL(page.url()).pathname !== url.split("?")[0]) {
    throw new Error(`${url} answered ${response?.status()} at ${page.url()}; is the lead signed in?`);
  }
  await page.waitForTimeout(SETTLE_MS);
  return page.evaluate(() => {
    const [nav] = performance.getEntriesByType("navigation") as PerformanceNavigationTiming[];
    const lastChartMark = (window as unknown as { lastChartMark?: number }).lastChartMark ?? 0;
    return { load: nav.loadEventEnd - nav.startTime, shown: Math.max(nav.loadEventEnd, lastChartMark) - nav.startTime };
  });
}

const quantile = (values: number[], q: number) => {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil(q * sorted.length) - 1)];
};

async function main() {
  if (!process.env.DATABASE_URL || !/bench/i.test(new URL(process.env.DATABASE_URL).pathname)) {
    throw new Error("Set DATABASE_URL to the seeded bench database the server uses (npm run bench report-pages does).");
  }
  // `npm run bench reports` adds 100,000 generated cases to the same database; these pages are measured on the demo data.
  const [{ generated }] = await sql<{ generated: number }[]>`select count(*)::int as generated from cases where reference like 'BN-%'`;
  if (generated > 0) throw new Error("The bench database holds the reports benchmark's generated cases; run report-pages on a freshly seeded one (before `reports`).");

  const [lead] = await db.select({ id: users.id }).from(users).where(eq(users.role, "lead")).limit(1);
  const [family] = await db.select({ slug: motorFamilies.slug }).from(motorFamilies).orderBy(motorFamilies.id).limit(1);
  const { token } = await createSession(lead.id);
  const pages = reportPages();
  // The two pages with data are also opened filtered to one motor family, as a lead often does.
  const urls = [...pages, ...pages.filter((p) => p !== "/reports/import").map((p) => `${p}?family=${family.slug}`), FLOOR];

  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", headless: true,
    args: ["--headless", "--disable-gpu", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-sandbox"],
  });
  const times = new Map<string, { load: number; shown: number }[]>(urls.map((u) => [u, []]));
  try {
    const context = await browser.newContext({ viewport: { width: 1360, height: 900 } });
    await context.addCookies([{ name: "rb_session", value: token, url: BASE }]);
    await context.addInitScript(watchChartMarks);
    const page = await context.newPage();
    for (let round = 0; round < WARMUP + LOADS; round++) {
      for (const url of urls) {
        const ms = await loadTime(page, url);
        if (round >= WARMUP) times.get(url)!.push(ms);
      }
    }
  } finally {
    await browser.close();
  }

  console.log(`\nreports pages, Chromium against the production build, signed in as the shop lead on the demo data; ${LOADS} loads each`);
  console.log("ms from navigation start: to the load event's end, and to shown (load event and every chart drawn)");
  console.log(`${"page".padEnd(44)}${"load median".padStart(12)}${"p95".padStart(8)}${"shown median".padStart(14)}${"p95".padStart(8)}`);
  for (const url of urls) {
    const runs = times.get(url)!;
    const load = runs.map((r) => r.load);
    const shown = runs.map((r) => r.shown);
    const p95 = quantile(shown, 0.95);
    const verdict = url === FLOOR ? "  floor: signed-in account page" : p95 <= BUDGET_MS ? `  within ${BUDGET_MS} ms` : `  OVER ${BUDGET_MS} ms`;
    console.log(`${url.padEnd(44)}${quantile(load, 0.5).toFixed(1).padStart(12)}${quantile(load, 0.95).toFixed(1).padStart(8)}` +
      `${quantile(shown, 0.5).toFixed(1).padStart(14)}${p95.toFixed(1).padStart(8)}${verdict}`);
  }
}

main()
  .catch((error: unknown) => {
    console.error(error);
    process.exitCode = 1;
  })
  .finally(() => sql.end({ timeout: 5 }));
