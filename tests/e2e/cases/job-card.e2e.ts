import { execFileSync } from "node:child_process";
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import jsQR from "jsqr";
import { PNG } from "pngjs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sql } from "@/db";
import { BenchPage } from "../pages/bench-page";
import { JobCardPage } from "../pages/job-card-page";
import { SignInPage } from "../pages/sign-in-page";
import { APP_URL, BASE_URL, openBrowser, SCREENSHOTS, type Browser } from "../support/browser";

// pdftoppm, pdfinfo and pdftotext are Debian's poppler-utils; npm test installs them when missing.
const poppler = (tool: string, args: string[]) => execFileSync(tool, args, { encoding: "utf8" });

describe("the printed job card of a booked-in unit", () => {
  let browser: Browser;
  let caseId: number;

  beforeAll(async () => {
    [{ id: caseId }] = await sql<{ id: number }[]>`select id from cases where status = 'booked_in' order by id limit 1`;
    browser = await openBrowser();
    const signIn = new SignInPage(browser.page);
    await signIn.open();
    await signIn.signIn("tech@rootbench.test");
    await browser.page.getByTestId("home-tech").waitFor();
  });
  afterAll(async () => { await browser?.close(); await sql.end({ timeout: 5 }); });

  it("prints on one A4 page whose QR code decodes to the case's address at the app's public address", async () => {
    const card = new JobCardPage(browser.page);
    await card.openFromCase(caseId);
    const reference = (await card.reference().innerText()).trim();
    expect(reference).toMatch(/^[A-Z]{2}-\d{4}-\d{4}$/);

    mkdirSync(SCREENSHOTS, { recursive: true });
    const pdfFile = path.join(SCREENSHOTS, "job-card.pdf");
    writeFileSync(pdfFile, await card.pdf());
    expect(poppler("pdfinfo", [pdfFile])).toMatch(/^Pages:\s+1$/m);

    const text = poppler("pdftotext", ["-layout", pdfFile, "-"]);
    for (const expected of [reference, "Reported symptom", "Ranking at the end of the call", "Bench plan", "What the caller sent", "disconnect all power"]) {
      expect(text).toContain(expected);
    }
    expect(text).not.toContain("Sign out");

    const pngBase = path.join(SCREENSHOTS, "job-card");
    poppler("pdftoppm", ["-png", "-r", "150", "-singlefile", pdfFile, pngBase]);
    const png = PNG.sync.read(readFileSync(`${pngBase}.png`));
    const qr = jsQR(new Uint8ClampedArray(png.data.buffer, png.data.byteOffset, png.data.byteLength), png.width, png.height);
    // APP_URL, not the address this browser happens to use (a QR code is scanned on another device).
    expect(qr?.data).toBe(`${APP_URL}/cases/${caseId}`);
    expect(APP_URL).not.toBe(BASE_URL);
  });

  it("prints the bench screen's plan, though the call stored none", async () => {
    const [{ benchPlan }] = await sql<{ benchPlan: unknown }[]>`select bench_plan as "benchPlan" from cases where id = ${caseId}`;
    expect(benchPlan).toBeNull();
    const bench = new BenchPage(browser.page);
    await bench.open(caseId);
    const checklist = await bench.stepCauses();
    expect(checklist.length).toBeGreaterThan(0);
    const card = new JobCardPage(browser.page);
    await card.openFromCase(caseId);
    expect(await card.benchPlanCauses()).toEqual(checklist.slice(0, 5));
  });

  it("is refused to a trainee, who never sees real cases", async () => {
    const trainee = await openBrowser();
    try {
      const signIn = new SignInPage(trainee.page);
      await signIn.open();
      await signIn.signIn("trainee@rootbench.test");
      await trainee.page.getByTestId("home-trainee").waitFor();
      const response = await trainee.page.goto(`${BASE_URL}/cases/${caseId}/job-card`);
      expect(response?.status()).toBe(403);
    } finally {
      await trainee.close();
    }
  });

  it("the browser saw no errors and no missing files", () => {
    expect(browser.errors).toEqual([]);
  });
});
