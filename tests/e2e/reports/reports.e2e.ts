import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ReportPage } from "../pages/report-page";
import { SignInPage } from "../pages/sign-in-page";
import { BASE_URL, openBrowser, screenshot, type Browser } from "../support/browser";

// Runs on the seeded demo shop (two years of simulated closed cases); counts are never asserted exactly.
describe("the shop lead's reports", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await openBrowser();
    const signIn = new SignInPage(browser.page);
    await signIn.open();
    await signIn.signIn("lead@rootbench.test");
    await browser.page.getByTestId("home-lead").waitFor({ timeout: 20000 });
  });
  afterAll(async () => { await browser.close(); });

  it("the lead's home shows the quarter's top causes", async () => {
    await browser.page.getByRole("heading", { name: "Top causes this quarter" }).waitFor();
    await screenshot(browser.page, "reports-lead-home");
  });

  it("opens the reports, changes period and motor family", async () => {
    const reports = new ReportPage(browser.page);
    await reports.open();
    expect(await reports.paretoRows().count()).toBeGreaterThan(3);
    // The charts arrive drawn with the page: the Pareto chart has a bar per charted cause (at most 15).
    const pareto = browser.page.getByRole("img", { name: /Pareto chart of confirmed causes/ });
    expect(await pareto.locator("rect.visx-bar").count()).toBe(Math.min(15, await reports.paretoRows().count()));
    await screenshot(browser.page, "reports-last-12-months");

    await reports.choosePreset(24);
    expect(await reports.scope().textContent()).toMatch(/all motor families/);
    const allFamilies = await reports.paretoRows().count();

    await reports.chooseFamily("Orvanta Tessel Gen 2");
    expect(browser.page.url()).toContain("last=24");
    expect(browser.page.url()).toContain("family=orvanta-tessel-2");
    expect(await reports.scope().textContent()).toMatch(/Orvanta Tessel Gen 2/);
    expect(await reports.paretoRows().count()).toBeLessThanOrEqual(allFamilies);
    await screenshot(browser.page, "reports-24-months-one-family");
  });

  it("the other report pages keep the period and family chosen", async () => {
    const reports = new ReportPage(browser.page);
    const scope = await reports.scope().textContent();
    await reports.goTo("Tree accuracy");
    expect(browser.page.url()).toMatch(/\/reports\/trees\?.*last=24.*family=orvanta-tessel-2/);
    expect(await reports.scope().textContent()).toBe(scope);
    await browser.page.getByTestId("accuracy-table").waitFor();
    await browser.page.getByTestId("calibration-table").waitFor();
    await screenshot(browser.page, "reports-tree-accuracy");

    await reports.goTo("Parts and labour");
    expect(await reports.scope().textContent()).toBe(scope);
    expect(await browser.page.getByRole("img", { name: /Parts replaced per month/ }).count()).toBe(1);
    // The period presets stay on this page, and the custom period's fields follow the preset.
    const customFrom = browser.page.getByRole("form", { name: "Custom period" }).getByLabel("From");
    const from24 = await customFrom.inputValue();
    await reports.choosePreset(6);
    expect(new URL(browser.page.url()).pathname).toBe("/reports/parts");
    expect(browser.page.url()).toContain("family=orvanta-tessel-2");
    expect(await customFrom.inputValue() > from24).toBe(true); // ISO dates sort as text
    await screenshot(browser.page, "reports-parts");

    await reports.goTo("Causes");
    expect(new URL(browser.page.url()).pathname).toBe("/reports");
    expect(browser.page.url()).toContain("last=6");
  });

  it("exports the same cases as CSV for a spreadsheet", async () => {
    const download = await new ReportPage(browser.page).exportCsv();
    expect(download.suggestedFilename()).toMatch(/^rootbench-cases-\d{4}-\d{2}-\d{2}-to-\d{4}-\d{2}-\d{2}-orvanta-tessel-2\.csv$/);
    const bytes = readFileSync((await download.path())!);
    expect([...bytes.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    const lines = bytes.toString("utf8").slice(1).split("\r\n");
    expect(lines[0].startsWith("date,reference,family,serial,riding_use")).toBe(true);
    expect(lines.filter((l) => l.includes(",orvanta-tessel-2,")).length).toBeGreaterThan(10);
  });

  it("the import page checks a file before anything is written", async () => {
    await browser.page.goto(`${BASE_URL}/reports/import`);
    const csv = "date,family,riding_use,symptom,cause\n2025-01-05,orvanta-tessel-2,trail,pedal-slip,no-such-cause\n";
    await browser.page.getByLabel(/CSV file of past repairs/).setInputFiles({ name: "old.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
    await browser.page.getByTestId("import-problems").waitFor();
    expect(await browser.page.getByTestId("import-problems").textContent()).toContain("\"no-such-cause\" is not a cause in the catalogue.");
    expect(await browser.page.getByText("Nothing in this file can be imported yet.").count()).toBe(1);
    await screenshot(browser.page, "reports-import-preview");
  });

  it("the browser saw no errors", () => {
    expect(browser.errors.filter((e) => !/WebSocket|_next\/webpack-hmr|hmr/.test(e))).toEqual([]);
  });
});

describe("a senior mechanic accepts an evidence suggestion", () => {
  let browser: Browser;
  beforeAll(async () => { browser = await openBrowser(); });
  afterAll(async () => { await browser.close(); });

  it("from the home page, into the tree's draft", async () => {
    const signIn = new SignInPage(browser.page);
    await signIn.open();
    await signIn.signIn("senior@rootbench.test");
    const digest = browser.page.getByTestId("review-digest");
    await digest.waitFor({ timeout: 20000 });
    await screenshot(browser.page, "review-senior-home");
    const button = digest.getByRole("button", { name: /in the draft$/ }).first();
    const label = (await button.textContent()) ?? "";
    const strength = /^Use “(against|neutral|for|strong)” in the draft$/.exec(label)?.[1];
    expect(strength).toBeDefined();
    const before = await digest.getByTestId("in-draft").count();
    await button.click();
    // The page comes back with the suggestion marked as written into the draft.
    await browser.page.waitForFunction(
      (n) => document.querySelectorAll("[data-testid=review-digest] [data-testid=in-draft]").length > n, before, { timeout: 20000 });
    await screenshot(browser.page, "review-accepted");
  });

  it("the browser saw no errors", () => {
    expect(browser.errors.filter((e) => !/WebSocket|hmr/.test(e))).toEqual([]);
  });
});
