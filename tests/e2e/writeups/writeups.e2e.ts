import { mkdtempSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SignInPage } from "../pages/sign-in-page";
import { WriteupEditorPage } from "../pages/writeup-editor-page";
import { WriteupSearchPage } from "../pages/writeup-search-page";
import { BASE_URL, openBrowser, screenshot, type Browser } from "../support/browser";

// The dev server's hot-reload socket is not part of the app; anything else the browser reports is.
// The refused SVG upload below answers 415 on purpose; the browser logs that as a console error.
const appErrors = (errors: string[]) => errors.filter((e) => !/WebSocket|_next\/hmr|status of 415 \(Unsupported Media Type\)/.test(e));

async function signedIn(role: string): Promise<Browser> {
  const b = await openBrowser();
  const signIn = new SignInPage(b.page);
  await signIn.open();
  await signIn.signIn(`${role}@rootbench.test`);
  await b.page.getByTestId(`home-${role}`).waitFor({ timeout: 30000 });
  return b;
}

describe("a trainee searches the write-ups and reads one", () => {
  let browser: Browser;
  beforeAll(async () => { browser = await signedIn("trainee"); });
  afterAll(async () => { await browser.close(); });

  it("finds write-ups as they type, forgiving a typo, with the matches marked", async () => {
    const search = new WriteupSearchPage(browser.page);
    await search.open();
    await search.type("bearnig");
    expect(await search.results().count()).toBeGreaterThan(0);
    const marked = await search.results().first().locator("mark").allInnerTexts();
    expect(marked.map((m) => m.toLowerCase())).toContain("bearing");
    await screenshot(browser.page, "writeups-search-typo");
  });

  it("puts the query in the address once typing pauses, so a reload shows the same results", async () => {
    const search = new WriteupSearchPage(browser.page);
    await search.open();
    await search.type("sprag clutch");
    await browser.page.waitForURL(`${BASE_URL}/writeups?q=sprag+clutch`);
    await browser.page.reload();
    await search.ready();
    expect(await search.input().inputValue()).toBe("sprag clutch");
    expect(await search.status().innerText()).toContain("for “sprag clutch”");
  });

  it("writes the address before leaving for a result opened within the pause, so Back returns to the query", async () => {
    const search = new WriteupSearchPage(browser.page);
    await search.open();
    await search.type("seal");
    const first = search.results().first().getByRole("link");
    const title = (await first.innerText()).trim();
    await first.click(); // well within the pause after the last key
    await browser.page.getByRole("heading", { level: 1, name: title }).waitFor();
    await browser.page.goBack();
    await browser.page.waitForURL(`${BASE_URL}/writeups?q=seal`);
    await search.ready();
    expect(await search.input().inputValue()).toBe("seal");
  });

  it("paints the first ten results and ten more on each request; one or two letters match whole words only", async () => {
    const search = new WriteupSearchPage(browser.page);
    await search.open();
    // An empty query lists the newest fifty of the demo's sixty-odd published write-ups.
    expect(await search.status().innerText()).toMatch(/^50\+ of \d{2} write-ups, newest first/);
    for (const shown of [10, 20, 30, 40]) {
      expect(await search.results().count()).toBe(shown);
      expect(await search.more().innerText()).toBe("Show 10 more");
      await search.more().click();
    }
    expect(await search.results().count()).toBe(50);
    expect(await search.more().count()).toBe(0);
    // "se" begins "seal", "seized", … but is no word of its own: nothing, and the hint says why.
    await search.type("se");
    expect(await search.results().count()).toBe(0);
    expect(await browser.page.getByText(/Words of one or two letters match only whole words/).count()).toBe(1);
    await search.type("sea");
    expect(await search.results().count()).toBeGreaterThan(0);
  });

  it("moves into the result links with the arrow keys and opens one with Enter", async () => {
    const search = new WriteupSearchPage(browser.page);
    await search.type("seal");
    const second = search.results().nth(1).getByRole("link");
    const title = (await second.innerText()).trim();
    await search.input().press("ArrowDown");
    await browser.page.keyboard.press("ArrowDown");
    expect(await second.evaluate((link) => link === document.activeElement)).toBe(true);
    await browser.page.keyboard.press("Enter");
    await browser.page.waitForURL(/\/writeups\/\d+$/);
    await browser.page.getByRole("heading", { level: 1, name: title }).waitFor();
    expect(await browser.page.getByTestId("writeup-body").locator("h2").count()).toBeGreaterThan(0);
    await screenshot(browser.page, "writeups-article");
  });

  it("shows a seeded write-up's drawing, served from the upload route", async () => {
    const search = new WriteupSearchPage(browser.page);
    await search.open();
    await search.type("sprag rolled");
    await search.results().first().getByRole("link").click();
    await browser.page.waitForURL(/\/writeups\/\d+$/);
    const img = browser.page.getByTestId("writeup-body").locator("img").first();
    expect(await img.getAttribute("src")).toMatch(/^\/api\/uploads\/[a-f0-9]{32}$/);
    await img.scrollIntoViewIfNeeded();
    await browser.page.waitForFunction(() => {
      const el = document.querySelector("[data-testid=writeup-body] img") as HTMLImageElement | null;
      return !!el && el.complete && el.naturalWidth > 0;
    });
    await browser.page.evaluate(() => window.scrollTo(0, 0));
    await screenshot(browser.page, "writeups-article-photo");
  });

  it("filters by cause from a chip, and the header box jumps to a search", async () => {
    const chip = browser.page.locator("a[href^='/writeups?cause=']").first();
    const href = (await chip.getAttribute("href"))!;
    await chip.click();
    await browser.page.waitForURL(`${BASE_URL}${href}`);
    const search = new WriteupSearchPage(browser.page);
    await search.ready();
    expect(await search.status().innerText()).toMatch(/with these filters/);
    expect(await browser.page.getByLabel("Cause", { exact: true }).inputValue()).toBe(href.split("=")[1]);
    await search.searchFromHeader("sprag");
    expect(await search.input().inputValue()).toBe("sprag");
    expect(await search.results().count()).toBeGreaterThan(0);
  });

  it("saw no errors", () => {
    expect(appErrors(browser.errors)).toEqual([]);
  });
});

describe("a technician drafts a write-up with a photo; a senior mechanic publishes it", () => {
  const title = `Crank seal weeping after a winter of salt ${Date.now().toString(36)}`;
  const dir = mkdtempSync(path.join(os.tmpdir(), "rootbench-photo-"));
  const photo = path.join(dir, "weeping seal.png");
  const fakePng = path.join(dir, "drawing.png");
  let writeupUrl = "";

  beforeAll(async () => {
    const png = await sharp({ create: { width: 900, height: 600, channels: 3, background: "#7a4a2a" } }).png().toBuffer();
    writeFileSync(photo, png);
    writeFileSync(fakePng, `<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"></svg>`);
  });

  it("the technician writes, previews, uploads a photo and saves a draft that renders as previewed", async () => {
    const b = await signedIn("tech");
    try {
      const editor = new WriteupEditorPage(b.page);
      await editor.openNew();
      await editor.fill({
        title,
        summary: "Salt crusted the crank seal and water crept past it into the non-drive bearing.",
        body: "## Reported\n\nA grinding at low cadence after the winter.\n\n## Found\n\n- seal lip hardened\n- bearing rough\n\n| Part | Minutes |\n|---|---:|\n| Seal | 20 |",
      });
      await editor.preview().locator("h2", { hasText: "Found" }).waitFor();
      await editor.uploadPhoto(fakePng);
      await editor.photoStatus().filter({ hasText: /JPEG, PNG or WebP.*SVG/ }).waitFor();
      await editor.uploadPhoto(photo);
      await editor.photoStatus().filter({ hasText: "added to the text" }).waitFor({ timeout: 30000 });
      expect(await editor.body().inputValue()).toMatch(/!\[weeping seal\]\(\/api\/uploads\/[a-f0-9]{32}\)/);
      const img = editor.preview().locator("img");
      await img.waitFor();
      await b.page.waitForFunction(() => {
        const el = document.querySelector("[data-testid=writeup-preview] img") as HTMLImageElement | null;
        return !!el && el.complete && el.naturalWidth > 0;
      });
      await editor.pickFirst("Motor families");
      await editor.pickFirst("Causes");
      await screenshot(b.page, "writeups-editor-preview");
      const previewHtml = await editor.preview().innerHTML();
      await editor.saveDraft();
      writeupUrl = b.page.url().replace(/\?.*$/, "");
      await b.page.getByText("Draft", { exact: true }).first().waitFor();
      expect(await b.page.getByTestId("writeup-body").innerHTML()).toBe(previewHtml);
      await b.page.waitForFunction(() => {
        const el = document.querySelector("[data-testid=writeup-body] img") as HTMLImageElement | null;
        return !!el && el.naturalWidth === 900;
      });
      expect(await b.page.getByRole("button", { name: "Publish" }).count()).toBe(0);
      await screenshot(b.page, "writeups-draft");
      expect(appErrors(b.errors)).toEqual([]);
    } finally {
      await b.close();
    }
  });

  it("the draft is not in a trainee's search", async () => {
    const b = await signedIn("trainee");
    try {
      const search = new WriteupSearchPage(b.page);
      await search.open();
      await search.type(title.split(" ").slice(-1)[0]);
      expect(await search.results().filter({ hasText: title }).count()).toBe(0);
      const response = await b.page.goto(writeupUrl);
      expect(response?.status()).toBe(403);
    } finally {
      await b.close();
    }
  });

  it("the senior mechanic publishes it, and it turns up in the search", async () => {
    const b = await signedIn("senior");
    try {
      await b.page.goto(writeupUrl);
      await b.page.getByRole("button", { name: "Publish" }).click();
      await b.page.getByText("Published", { exact: true }).first().waitFor();
      await screenshot(b.page, "writeups-published");
      const search = new WriteupSearchPage(b.page);
      await search.open();
      await search.type(title.split(" ").slice(-1)[0]);
      await search.results().filter({ hasText: title }).first().waitFor();
      expect(appErrors(b.errors)).toEqual([]);
    } finally {
      await b.close();
    }
  });
});
