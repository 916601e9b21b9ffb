import { mkdirSync, mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";

export const BASE_URL = process.env.E2E_BASE_URL ?? "http://127.0.0.1:3100";
/** The server's APP_URL: the same server under another name than the browser's, so links built from it can be told apart. */
export const APP_URL = process.env.E2E_APP_URL ?? BASE_URL.replace("127.0.0.1", "localhost");
export const SCREENSHOTS = path.resolve(__dirname, "../screenshots");
export const DEMO_PASSWORD = "bench-demo-2026";

export interface Browser {
  context: BrowserContext;
  page: Page;
  errors: string[];
  close: () => Promise<void>;
}

/** A fresh headless Chromium profile (Debian's chromium; never a downloaded browser). */
export async function openBrowser(): Promise<Browser> {
  const profile = mkdtempSync(path.join(os.tmpdir(), "rootbench-e2e-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    viewport: { width: 1360, height: 900 },
    args: ["--headless", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
      "--disable-component-update", "--disable-sync", "--no-sandbox"],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const errors: string[] = [];
  page.on("pageerror", (e) => errors.push(`pageerror: ${e.message}`));
  page.on("console", (m) => { if (m.type() === "error") errors.push(`console: ${m.text()}`); });
  page.on("response", (r) => { if (r.status() === 404) errors.push(`404: ${r.url()}`); });
  return {
    context, page, errors,
    close: async () => { await context.close(); rmSync(profile, { recursive: true, force: true }); },
  };
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENSHOTS, { recursive: true });
  await page.screenshot({ path: path.join(SCREENSHOTS, `${name}.png`), fullPage: true });
}
