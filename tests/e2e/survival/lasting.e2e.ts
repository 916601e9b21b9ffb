import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { LastingPage } from "../pages/lasting-page";
import { SignInPage } from "../pages/sign-in-page";
import { TriageNewPage } from "../pages/triage-new-page";
import { TriageWalkPage } from "../pages/triage-walk-page";
import { openBrowser, screenshot, type Browser } from "../support/browser";

// Runs on the seeded demo shop, whose simulated history fits upgrades and brings some units back.
// Exact figures are never asserted; what the page must show, and say, is.
async function shot(page: Browser["page"], name: string): Promise<void> {
  await page.waitForLoadState("networkidle");
  await screenshot(page, name);
}

describe("does the repair last?", () => {
  // Each person signs in in a browser of their own.
  let browser: Browser;
  beforeEach(async () => { browser = await openBrowser(); });
  afterEach(async () => { await browser.close(); });

  it("the lead filters a family and reads curves, p-values and the 3/6/12-month table", async () => {
    const { page } = browser;
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn("lead@rootbench.test");
    await page.getByTestId("home-lead").waitFor({ timeout: 20000 });

    const lasting = new LastingPage(page);
    await lasting.openFromReports();
    expect(await lasting.scope().textContent()).toMatch(/all motor families, all riding uses/);
    // Across the whole shop the demo record shows a clear benefit and an upgrade with no difference.
    const kinds = await lasting.verdicts().evaluateAll((els) => els.map((e) => e.getAttribute("data-verdict")));
    expect(kinds).toHaveLength(6);
    expect(kinds).toContain("better");
    expect(kinds).toContain("no_difference");
    expect(await page.getByTestId("warranty-table").locator("tbody tr").count()).toBeGreaterThan(2);
    await shot(page, "lasting-all-families");

    await lasting.filter({ family: "Orvanta Tessel Gen 2" });
    expect(page.url()).toContain("family=orvanta-tessel-2");
    expect(await lasting.scope().textContent()).toMatch(/Orvanta Tessel Gen 2/);
    const clutch = lasting.comparison("uprated-clutch");
    expect(await clutch.getByTestId("p-value").textContent()).toMatch(/^p (=|<) 0\.\d+$/);
    expect(await clutch.getByTestId("verdict").textContent()).toMatch(/(less|more) often|No difference shown|Too early to tell/);
    // Both arms drawn as step lines with the page, each named with its number of units.
    const curves = clutch.getByTestId("chart");
    expect(await curves.locator("path.visx-linepath").count()).toBe(2);
    expect(await curves.locator("title").allTextContents()).toEqual([expect.stringMatching(/^Fitted \(n = \d+\)$/), expect.stringMatching(/^Not fitted \(n = \d+\)$/)]);
    expect(await clutch.getByTestId("checkpoints").locator("tbody tr").count()).toBe(2);
    const header = await clutch.getByTestId("checkpoints").locator("thead").textContent();
    expect(header).toMatch(/3 months.*6 months.*12 months/);
    expect(await clutch.getByTestId("at-risk").locator("tbody tr").count()).toBe(2);
    await shot(page, "lasting-one-family");

    // A family and use with too few repairs says so instead of drawing a conclusion.
    await lasting.filter({ family: "Brightholm Ostra Gen 2", use: "commuting" });
    const verdicts = await page.getByTestId("verdict").allTextContents();
    expect(verdicts.every((v) => v.startsWith("Too early to tell") || v.startsWith("No repairs of"))).toBe(true);
    expect(verdicts.some((v) => v.startsWith("Too early to tell"))).toBe(true);
    await shot(page, "lasting-too-few");
  });

  it("a technician books a unit in and sees what the record says about upgrades", async () => {
    const { page } = browser;
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn("tech@rootbench.test");
    await page.getByTestId("home-tech").waitFor();

    await new TriageNewPage(page).startCall({ callerName: "Ines Varrow", phone: "+00 555 0142 7781", family: "Orvanta Tessel Gen 2", serial: "TS2-40417", ridingUse: "trail", symptom: "Pedals slip or no drive" });
    const walk = new TriageWalkPage(page);
    await walk.ready();
    await walk.answerWithKey("Pedals spin forward");
    await walk.waitForConfirmedSteps(1);
    await walk.bookIn("The drive unit only");
    await page.waitForURL(/\/cases\/\d+\?finished=1$/);

    const advice = page.getByTestId("upgrade-advice");
    await advice.waitFor();
    expect(await advice.textContent()).toContain("Orvanta Tessel Gen 2 units used for trail riding");
    // Every claim carries its figures and its test.
    const supported = await page.getByTestId("advice-supported").allTextContents();
    expect(supported.length).toBeGreaterThan(0);
    for (const line of supported) expect(line).toMatch(/less often: \d+\u00a0% with vs \d+\u00a0% without by \d+ months \(p (=|<) 0\.\d+; n = \d+ with, \d+ without\)/);
    await shot(page, "lasting-advice-at-booking");
  });
});
