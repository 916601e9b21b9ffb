import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PracticeCasePage } from "../pages/practice-case-page";
import { SignInPage } from "../pages/sign-in-page";
import { BASE_URL, openBrowser, screenshot, type Browser } from "../support/browser";

const appErrors = (errors: string[]) => errors.filter((e) => !/WebSocket|_next\/hmr/.test(e));

describe("a trainee runs a practice case", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await openBrowser();
    const signIn = new SignInPage(browser.page);
    await signIn.open();
    await signIn.signIn("trainee@rootbench.test");
    await browser.page.getByTestId("home-trainee").waitFor({ timeout: 30000 });
  });
  afterAll(async () => { await browser.close(); });

  it("picks the first closed case, reveals the answers one by one, commits, and sees the bench result", async (ctx) => {
    const practice = new PracticeCasePage(browser.page);
    await practice.openList();
    await screenshot(browser.page, "practice-list");
    if ((await practice.caseLinks().count()) === 0) {
      ctx.skip("The database holds no closed case with steps and a confirmed cause yet (the seeded history adds them).");
      return;
    }
    await practice.caseLinks().first().click();
    await browser.page.waitForURL(/\/practice\/\d+$/);
    await browser.page.getByTestId("practice-current").waitFor();
    // No caller details anywhere on the page: no names are known here, but phone numbers and addresses have a shape.
    const text = await browser.page.locator("main").innerText();
    expect(text).not.toMatch(/\+\d{2}[\d ]{6,}|@[a-z0-9.-]+\.[a-z]{2,}/i);
    expect(await practice.rankingCaption().innerText()).toMatch(/after 0 of \d+ answers/);
    await practice.revealButton().click();
    await practice.answers().first().waitFor();
    expect(await practice.answers().first().innerText()).toMatch(/^(The caller said|The check showed|The caller did not know|The check was not done)/);
    expect(await practice.rankingCaption().innerText()).toMatch(/after 1 of \d+ answers/);
    await screenshot(browser.page, "practice-walk");
    const shown = 1 + (await practice.revealAll());
    expect(await practice.rankingCaption().innerText()).toBe(`after ${shown} of ${shown} answers`);
    expect(await browser.page.getByTestId("practice-result").count()).toBe(0);
    const committed = await practice.commitToFirstCause();
    const result = await browser.page.getByTestId("practice-result").innerText();
    expect(result).toContain(`You committed to ${committed}`);
    expect(result).toMatch(/Confirmed at the bench/i);
    await screenshot(browser.page, "practice-result");

    await browser.page.goto(`${BASE_URL}/`);
    const history = browser.page.getByTestId("practice-history");
    await history.waitFor();
    expect(await history.innerText()).toMatch(/Cases done\s*\d+/i);
    await screenshot(browser.page, "practice-home-history");
  });

  it("saw no errors", () => {
    expect(appErrors(browser.errors)).toEqual([]);
  });
});
