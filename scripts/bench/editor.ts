// The tree editor in Chromium on a generated 300-node draft: time from navigation to a usable
// canvas (every node drawn and fitted in view), a pan, and the save round trip of the whole graph.
// Needs DATABASE_URL (the tree and a senior account are written there) and BENCH_BASE_URL, the
// server reading the same database. `npm run bench editor` sets both up against a production build.
import { chromium, type Page } from "playwright-core";
import { db, sql } from "@/db";
import { CAUSE_AREAS, causes, trees, treeVersions, users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";
import { SESSION_COOKIE } from "@/lib/auth/lucia";
import { createSession } from "@/lib/auth/session";
import type { GraphInput } from "@/lib/trees/graph-types";
import { writeGraph } from "@/lib/trees/graph";
import { prng } from "@/lib/random";
import { autoLayout } from "@/lib/trees/layout";

const NODES = 300;
const CAUSE_COUNT = 30;
const OPTIONS_PER_NODE = 3;
const RUNS = 5;
const BASE = process.env.BENCH_BASE_URL ?? "http://127.0.0.1:3200";
const STRENGTHS = ["rules_out", "against", "for", "strong"] as const;

/** mulberry32, so every run measures the same tree. */

/** 270 questions and checks (3 answers each, edges forward only) and 30 cause nodes, laid out by dagre. */
function generateGraph(slugs: string[]): GraphInput {
  const random = prng(4242);
  const asking = NODES - slugs.length;
  const nodes: GraphInput["nodes"] = [];
  const options: GraphInput["options"] = [];
  for (let i = 0; i < asking; i++) {
    const check = random() < 0.3;
    nodes.push({ key: `n${i}`, kind: check ? "check" : "question", title: `Generated ${check ? "check" : "question"} ${i}`,
      prompt: "Generated for the editor benchmark.", costMinutes: check ? 5 + Math.floor(random() * 26) : 1, needsOpening: false,
      causeSlug: null, cautionText: "", posX: 0, posY: 0 });
    for (let o = 0; o < OPTIONS_PER_NODE; o++) {
      const target = i + 1 + Math.floor(random() * Math.min(40, NODES - i - 1));
      const evidence: Record<string, (typeof STRENGTHS)[number]> = {};
      for (let e = 0; e < 3; e++) evidence[slugs[Math.floor(random() * slugs.length)]] = STRENGTHS[Math.floor(random() * STRENGTHS.length)];
      options.push({ key: `n${i}-o${o}`, fromKey: `n${i}`, toKey: target < asking ? `n${target}` : `c${target - asking}`, label: `Answer ${o + 1}`, dontKnow: false, evidence });
    }
  }
  slugs.forEach((slug, k) => nodes.push({ key: `c${k}`, kind: "cause", title: `Cause ${k}`, prompt: "Generated.", costMinutes: 1,
    needsOpening: false, causeSlug: slug, cautionText: "", posX: 0, posY: 0 }));
  const graph: GraphInput = { rootKey: "n0", causes: slugs.map((slug) => ({ slug, priorWeight: 1 + Math.floor(random() * 9) })), nodes, options };
  const at = autoLayout(graph);
  return { ...graph, nodes: graph.nodes.map((n) => ({ ...n, posX: at.get(n.key)!.x, posY: at.get(n.key)!.y })) };
}

async function setUp() {
  const stamp = Date.now().toString(36);
  const slugs = Array.from({ length: CAUSE_COUNT }, (_, k) => `bench-editor-${stamp}-cause-${k}`);
  await db.insert(causes).values(slugs.map((slug, k) => ({ slug, name: `Benchmark cause ${k}`, area: CAUSE_AREAS[k % CAUSE_AREAS.length] })));
  const userId = `bench-senior-${stamp}`;
  await db.insert(users).values({ id: userId, email: `${userId}@rootbench.test`, name: "Benchmark Senior", role: "senior", passwordHash: await hashPassword(`unused-${stamp}-password`) });
  const treeId = await db.transaction(async (tx) => {
    const [tree] = await tx.insert(trees).values({ slug: `bench-editor-${stamp}`, symptom: "Benchmark symptom", title: "Generated 300-node tree", createdBy: userId }).returning({ id: trees.id });
    const [version] = await tx.insert(treeVersions).values({ treeId: tree.id, number: 1, editedBy: userId }).returning({ id: treeVersions.id });
    await writeGraph(tx, version.id, generateGraph(slugs));
    return tree.id;
  });
  const { token } = await createSession(userId);
  return { treeId, token };
}

/** A point of the canvas with no node, edge or control under it, so a drag there pans. */
async function emptyPanePoint(page: Page): Promise<{ x: number; y: number }> {
  const spot = await page.evaluate(() => {
    const box = document.querySelector('[data-testid="tree-canvas"]')!.getBoundingClientRect();
    for (let fy = 0.3; fy < 0.7; fy += 0.05) {
      for (let fx = 0.05; fx < 0.6; fx += 0.05) {
        const x = box.left + box.width * fx;
        const y = box.top + box.height * fy;
        if (document.elementFromPoint(x, y)?.classList.contains("react-flow__pane")) return { x, y };
      }
    }
    return null;
  });
  if (!spot) throw new Error("no empty spot on the canvas to pan from");
  return spot;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const fmt = (xs: number[]) => `median ${Math.round(median(xs))} ms (min ${Math.round(Math.min(...xs))}, max ${Math.round(Math.max(...xs))})`;

async function main() {
  const { treeId, token } = await setUp();
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: ["--headless", "--disable-gpu", "--no-sandbox", "--disable-background-networking", "--no-first-run"],
  });
  const url = new URL(BASE);
  const ready: number[] = [];
  const pan: number[] = [];
  const save: number[] = [];
  try {
    for (let run = 0; run <= RUNS; run++) {
      const context = await browser.newContext({ viewport: { width: 1360, height: 900 } });
      await context.addCookies([{ name: SESSION_COOKIE, value: token, domain: url.hostname, path: "/", httpOnly: true, sameSite: "Lax" }]);
      const page = await context.newPage();
      await page.goto(`${BASE}/trees/${treeId}/edit`);
      await page.locator('[data-testid="tree-canvas"][data-canvas-ready="true"]').waitFor({ timeout: 120_000 });
      const readyMs = await page.evaluate(() => window.__rbCanvasReady ?? NaN);
      const drawn = await page.locator(".react-flow__node").count();
      if (drawn !== NODES) throw new Error(`expected ${NODES} nodes on the canvas, saw ${drawn}`);

      // Pan: drag the empty pane and wait until the viewport transform has followed.
      const spot = await emptyPanePoint(page);
      const before = await page.locator(".react-flow__viewport").getAttribute("style");
      const panStart = Date.now();
      await page.mouse.move(spot.x, spot.y);
      await page.mouse.down();
      await page.mouse.move(spot.x + 200, spot.y + 120, { steps: 10 });
      await page.mouse.up();
      await page.waitForFunction((s) => document.querySelector(".react-flow__viewport")?.getAttribute("style") !== s, before);
      const panMs = Date.now() - panStart;

      // Save: change one title in the side panel, then time the click on Save to the server's answer shown.
      await page.getByTestId("rf__node-n0").click();
      await page.getByTestId("node-form").getByLabel("Title").fill(`Generated question 0, run ${run}`);
      const saveStart = Date.now();
      await page.getByRole("button", { name: "Save draft" }).click();
      await page.waitForFunction(() => /^Draft saved/.test(document.querySelector('[data-testid="editor-status"]')?.textContent ?? ""), null, { timeout: 60_000 });
      const saveMs = Date.now() - saveStart;
      await context.close();
      if (run === 0) continue; // warm-up: first compile and caches
      ready.push(readyMs);
      pan.push(panMs);
      save.push(saveMs);
    }
  } finally {
    await browser.close();
    await sql.end();
  }
  console.log(`Tree editor, ${NODES} nodes and ${(NODES - CAUSE_COUNT) * OPTIONS_PER_NODE} answers, ${RUNS} runs after one warm-up, against ${BASE}`);
  console.log(`  navigation → usable canvas (all nodes drawn, fitted): ${fmt(ready)}`);
  console.log(`  pan (drag until the viewport moved):                   ${fmt(pan)}`);
  console.log(`  save round trip (click → "Draft saved" shown):         ${fmt(save)}`);
  if (process.env.BENCH_HOLD_SECONDS) { console.log("HOLDING"); await new Promise((r) => setTimeout(r, Number(process.env.BENCH_HOLD_SECONDS) * 1000)); }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});

