import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sql } from "@/db";
import { SignInPage } from "../pages/sign-in-page";
import { axeViolations } from "../support/axe";
import { BASE_URL, openBrowser, screenshot, type Browser } from "../support/browser";
import { SCREENS, type SweepIds } from "./screens";
import { findSweepIds } from "./sweep-ids";

/** A few screens with the most kinds of colour on them: tags, tints, charts, forms, the tree canvas. */
const DARK_SCREENS = ["home", "triage walk", "case on the bench", "write-ups", "reports", "tree editor"];

describe("the dark workshop theme, chosen by a senior mechanic", () => {
  let browser: Browser;
  let ids: SweepIds;

  beforeAll(async () => {
    ids = await findSweepIds();
    browser = await openBrowser();
    const signIn = new SignInPage(browser.page);
    await signIn.open();
    await signIn.signIn("senior@rootbench.test");
    await browser.page.getByTestId("home-senior").waitFor();
  });
  afterAll(async () => {
    // The demo account goes back to the light theme for the other browser tests.
    await sql`update users set theme = 'light' where email = 'senior@rootbench.test'`;
    await browser?.close();
    await sql.end({ timeout: 5 });
  });

  it("is switched on from the header, kept with the account, and passes axe-core at 1360 and 390 px", async () => {
    const { page } = browser;
    const html = page.locator("html");
    const switchButton = page.getByRole("button", { name: "Dark theme" });
    // With a navigation too long for the row, the account and its switch sit in the menu.
    if (!(await switchButton.isVisible())) await page.getByTestId("menu-button").click();
    expect(await switchButton.getAttribute("aria-pressed")).toBe("false");
    await switchButton.click();
    await page.waitForFunction(() => document.documentElement.dataset.theme === "dark");
    expect(await page.getByTestId("theme-switch").first().getAttribute("aria-pressed")).toBe("true");
    const [{ theme }] = await sql<{ theme: string }[]>`select theme from users where email = 'senior@rootbench.test'`;
    expect(theme).toBe("dark");

    const found: Record<string, string[]> = {};
    for (const name of DARK_SCREENS) {
      const screen = SCREENS.find((s) => s.name === name);
      if (!screen) throw new Error(`no screen named ${name}`);
      await page.setViewportSize({ width: 1360, height: 900 });
      await page.goto(`${BASE_URL}${screen.path(ids)}`);
      await page.waitForLoadState("networkidle");
      if (screen.ready) await page.locator(screen.ready).first().waitFor();
      expect(await html.getAttribute("data-theme"), `${name} is dark`).toBe("dark");
      for (const width of [1360, 390]) {
        await page.setViewportSize({ width, height: width > 800 ? 900 : 844 });
        await page.evaluate(() => new Promise<void>((done) => requestAnimationFrame(() => requestAnimationFrame(() => done()))));
        const violations = await axeViolations(page);
        if (violations.length) found[`${name} at ${width} px`] = violations;
        await screenshot(page, `a11y-dark-${width}-${name.replace(/ /g, "-")}`);
      }
      if (name === "tree editor") {
        // The canvas library's own parts (documented class names) take the dark palette too.
        for (const part of [".react-flow__minimap", ".react-flow__controls-button"]) {
          const background = await page.locator(part).first().evaluate((el) => getComputedStyle(el).backgroundColor);
          expect(luminance(background), `${part} background ${background}`).toBeLessThan(0.05);
        }
      }
    }
    expect(found).toEqual({});
    expect(browser.errors).toEqual([]);
  }, 600_000);
});

/** Relative luminance of a CSS rgb()/rgba() colour (WCAG 2.1 definition). */
function luminance(css: string): number {
  const [r, g, b] = (css.match(/[\d.]+/g) ?? []).slice(0, 3).map(Number).map((v) => {
    const c = v / 255;
    return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
