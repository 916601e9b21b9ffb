import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { EvidenceReviewPage } from "../pages/evidence-review-page";
import { SignInPage } from "../pages/sign-in-page";
import { openBrowser, screenshot, type Browser } from "../support/browser";

// On the seeded demo shop: the history holds mis-weighted answers on this tree for the review to find.
describe("a senior mechanic reads an evidence suggestion on the tree page and accepts it", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await openBrowser();
    const signIn = new SignInPage(browser.page);
    await signIn.open();
    await signIn.signIn("senior@rootbench.test");
    await browser.page.waitForURL((url) => !url.pathname.startsWith("/sign-in"), { timeout: 20000 });
  });
  afterAll(async () => { await browser.close(); });

  it("sees which likelihoods triage uses and why", async () => {
    const review = new EvidenceReviewPage(browser.page);
    await review.openTree("Clicking or popping under load");
    // Hundreds of closed cases on the published version: left to decide, the tree scores with learned likelihoods.
    expect(await review.inUse().textContent()).toMatch(/scores with likelihoods learned from closed cases\..*closed cases, enough/);
    await review.panel().scrollIntoViewIfNeeded();
    await screenshot(browser.page, "evidence-review-tree-page");
  });

  it("reads the counts, both distributions and how sure, then writes the proposal into the draft", async () => {
    const review = new EvidenceReviewPage(browser.page);
    const suggestion = review.firstOpen();
    const text = (await suggestion.textContent()) ?? "";
    expect(text).toMatch(/closed cases of “.+” answered “.+”/);
    expect(text).toMatch(/times likelier if the tree is off here than if it is right: (strong|very strong) evidence/);
    expect(text).toMatch(/Change “.+” from “.+” to “.+”/);
    const rows = suggestion.getByTestId("suggestion-column").locator("tbody tr");
    expect(await rows.count()).toBeGreaterThanOrEqual(2);
    const headers = await suggestion.getByTestId("suggestion-column").locator("thead th").allTextContents();
    expect(headers.slice(0, 4)).toEqual(["Answer", "Cases", "Tree", "Learned"]);
    await suggestion.scrollIntoViewIfNeeded();
    await screenshot(browser.page, "evidence-review-suggestion");

    const key = await suggestion.getAttribute("data-key");
    await review.accept(suggestion);
    const accepted = review.panel().locator(`[data-testid=suggestion][data-key="${key}"]`);
    await accepted.getByText(/^In draft \d+: “.+”\. Publish the draft to use it\.$/).waitFor({ timeout: 20000 });
    await screenshot(browser.page, "evidence-review-accepted");
  });

  it("the browser saw no errors", () => {
    expect(browser.errors.filter((e) => !/WebSocket|hmr/.test(e))).toEqual([]);
  });
});
