import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BenchPage } from "../pages/bench-page";
import { SignInPage } from "../pages/sign-in-page";
import { BASE_URL, openBrowser, screenshot, type Browser } from "../support/browser";

const SHOWCASE = "WD-DEMO-0018"; // the demo unit on the bench (content/history/bench-demo.json)

async function shot(page: Browser["page"], name: string): Promise<void> {
  await page.waitForLoadState("networkidle");
  await screenshot(page, name);
}

describe("bench teardown on a tablet", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await openBrowser();
    await browser.page.setViewportSize({ width: 820, height: 1180 });
  });
  afterAll(async () => { await browser.close(); });

  it("a technician follows the checklist, records a not-found and a found with a photo, takes a companion and closes the case", async () => {
    const { page } = browser;
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn("tech@rootbench.test");
    await page.getByTestId("home-tech").waitFor();

    await page.goto(`${BASE_URL}/cases?status=on_bench&q=${SHOWCASE}`);
    await page.getByRole("link", { name: SHOWCASE }).click();
    await page.getByTestId("case-page").waitFor();
    expect(await page.getByTestId("bench-plan").locator("li").count()).toBeGreaterThan(0); // a unit on the bench always has a plan
    await page.getByRole("link", { name: "Open the bench checklist" }).click();
    const bench = new BenchPage(page);
    await page.getByTestId("bench-page").waitFor();
    await shot(page, "bench-1-start-820");

    // The first stage of the checklist shows what it opens; deeper stages carry their caution.
    const first = (await bench.stepCauses())[0];
    const minutesAtStart = await bench.minutesLeft();
    const clutchBefore = await bench.probabilityOf("owc-cage-broken");
    expect(await page.getByTestId("stage-caution").count()).toBeGreaterThan(0);

    // Not found on the first inspection: it leaves the checklist, the others gain, minutes left change.
    await bench.record(first, "not_found");
    expect(await bench.stepCauses()).not.toContain(first);
    expect(await bench.probabilityOf(first)).toBeLessThan(0.1);
    expect(await bench.probabilityOf("owc-cage-broken")).toBeGreaterThan(clutchBefore);
    const minutesAfterMiss = await bench.minutesLeft();
    expect(minutesAfterMiss).not.toBe(minutesAtStart);

    // Found, with a photo, on the clutch cage.
    const photo = await sharp({ create: { width: 96, height: 64, channels: 3, background: "#8a5a2b" } }).jpeg().toBuffer();
    await bench.record("owc-cage-broken", "found", { name: "clutch-cage.jpg", mimeType: "image/jpeg", buffer: photo });
    expect(await bench.probabilityOf("owc-cage-broken")).toBeGreaterThan(0.8);
    await page.getByTestId("finding-thumb").first().waitFor();
    expect(await bench.minutesLeft()).toBeLessThan(minutesAfterMiss);
    await shot(page, "bench-2-found-820");

    // With the crank assembly open, the shop's history suggests a companion inside it.
    await bench.companions().first().waitFor();
    const companion = (await bench.companions().first().getAttribute("data-cause"))!;
    await bench.acceptCompanion(companion);
    expect((await bench.stepCauses())[0]).toBe(companion);
    await bench.record(companion, "found");
    await shot(page, "bench-3-companion-820");

    // Finishing fills the outcome form: both causes confirmed, their parts, labour with opening and closing.
    await bench.finish();
    const form = page.getByRole("form", { name: "Bench outcome" });
    expect(Number(await form.getByLabel(/Labour/).inputValue())).toBeGreaterThan(0);
    await shot(page, "bench-4-finish-820");
    await form.getByRole("button", { name: /close/i }).click();
    await page.getByText(/closed/).first().waitFor();
    await page.goto(`${BASE_URL}/cases?q=${SHOWCASE}`);
    await page.getByRole("link", { name: SHOWCASE }).click();
    await page.getByTestId("case-page").waitFor();
    await expect(page.getByTestId("outcome-section").textContent()).resolves.toMatch(/Closed/);
    await shot(page, "bench-5-closed-820");

    expect(browser.errors.filter((e) => !/_next\/hmr|WebSocket/.test(e))).toEqual([]);
  }, 180_000);
});
