import { eq } from "drizzle-orm";
import { chromium } from "playwright-core";
import { db, sql } from "@/db";
import { users } from "@/db/schema";
import { createSession } from "@/lib/auth/session";
const BASE = "http://127.0.0.1:3200";
async function main() {
  const [lead] = await db.select({ id: users.id }).from(users).where(eq(users.email, "lead@rootbench.test")).limit(1);
  const { token } = await createSession(lead.id);
  const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", headless: true, args: ["--headless", "--disable-gpu", "--no-sandbox"] });
  const context = await browser.newContext({ viewport: { width: 1360, height: 900 } });
  await context.addCookies([{ name: "rb_session", value: token, url: BASE }]);
  const page = await context.newPage();
  const urls = (process.argv[2] ?? "/reports,/account").split(",");
  const acc = new Map<string, number[][]>(urls.map((u) => [u, []]));
  for (let r = 0; r < 33; r++) for (const url of urls) {
    await page.goto("about:blank"); await page.waitForTimeout(100);
    await page.goto(BASE + url, { waitUntil: "load" });
    const t = await page.evaluate(() => { const [n] = performance.getEntriesByType("navigation") as PerformanceNavigationTiming[]; return [n.responseStart, n.responseEnd, n.domInteractive, n.loadEventEnd]; });
    if (r >= 3) acc.get(url)!.push(t);
  }
  for (const [url, rows] of acc) {
    rows.sort((a, b) => a[3] - b[3]);
    console.log(url, "slowest 5 [ttfb, respEnd, domInteractive, load]:", rows.slice(-5).map((x) => x.map((v) => v.toFixed(0)).join("/")).join("  "), " median:", rows[15].map((v) => v.toFixed(0)).join("/"));
  }
  await browser.close(); await sql.end();
}
main();
