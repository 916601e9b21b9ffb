import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SignInPage } from "../pages/sign-in-page";
import { TriageNewPage } from "../pages/triage-new-page";
import { TriageWalkPage } from "../pages/triage-walk-page";
import { openBrowser, screenshot, type Browser } from "../support/browser";

// The walk screen between a keypress and the server's reply: nothing moves while the reply is quick,
// "Saving…" once it is slow, one answer at a time, and a clear message when the server is gone.
describe("triage answers on a slow or broken connection", () => {
  let browser: Browser;
  let walk: TriageWalkPage;
  const answerPosts = /\/triage\/\d+$/;

  beforeAll(async () => {
    browser = await openBrowser();
    const { page } = browser;
    await new SignInPage(page).open();
    await new SignInPage(page).signIn("tech@rootbench.test");
    await page.getByTestId("home-tech").waitFor();
    await new TriageNewPage(page).startCall({
      callerName: "Oda Brennick", phone: "+00 555 0199 4413", family: "Orvanta Tessel Gen 2",
      ridingUse: "road", symptom: "Pedals slip or no drive", words: "slips now and then",
    });
    walk = new TriageWalkPage(page);
    await walk.ready();
    await walk.waitForQuestion("q-what");
  });
  afterAll(async () => { await browser.close(); });

  it("a slow answer shows it is saving and keeps a second key out until the reply is shown", async () => {
    const { page } = browser;
    let release = () => {};
    const held = new Promise<void>((resolve) => { release = resolve; });
    await page.route(answerPosts, async (route) => {
      if (route.request().method() !== "POST") return route.fallback();
      await held;
      await route.continue();
    });
    await walk.answerWithKey("Pedals spin forward");
    await page.getByTestId("walk-saving").filter({ hasText: "Saving…" }).waitFor();
    expect(await page.getByTestId("walk-screen").getAttribute("data-pending")).toBe("yes");
    expect(await page.getByTestId("answer-option").first().isDisabled()).toBe(true);
    await screenshot(page, "triage-saving");
    await page.keyboard.press("2"); // the first answer is still on its way: this key is dropped

    release();
    await walk.waitForConfirmedSteps(1);
    await page.waitForTimeout(500); // time for a second answer to land, had the key been taken
    expect(await page.getByTestId("trail-step").count()).toBe(1);
    expect(await page.getByTestId("walk-saving").textContent()).toBe("");
    await page.unroute(answerPosts);
  });

  it("an unreachable server is named, nothing is stored, and the same key works once it is back", async () => {
    const { page } = browser;
    const question = await walk.currentNode();
    await page.route(answerPosts, (route) => route.request().method() === "POST" ? route.abort("connectionrefused") : route.fallback());
    await page.keyboard.press("1");
    await page.getByTestId("walk-error").filter({ hasText: "could not be reached" }).waitFor();
    expect(await page.getByTestId("walk-error").textContent()).toBe("The answer was not saved. The server could not be reached; try again.");
    expect(await page.getByTestId("trail-step").count()).toBe(1);
    expect(await walk.currentNode()).toBe(question);

    await page.unroute(answerPosts);
    await page.keyboard.press("1");
    await walk.waitForConfirmedSteps(2);
    expect(await page.getByTestId("walk-error").count()).toBe(0);
    await page.reload();
    await walk.waitForConfirmedSteps(2); // what the screen showed is what was stored
  });

  it("the browser saw no errors but the refused connection", () => {
    expect(browser.errors.filter((e) => !/ERR_CONNECTION_REFUSED|Failed to fetch/.test(e))).toEqual([]);
  });
});
