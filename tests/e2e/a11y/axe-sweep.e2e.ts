import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sql } from "@/db";
import { ALL_ROLES, may } from "@/lib/auth/roles";
import { SignInPage } from "../pages/sign-in-page";
import { axeViolations } from "../support/axe";
import { BASE_URL, openBrowser, screenshot, type Browser } from "../support/browser";
import { smallTargets } from "../support/touch-targets";
import { SCREENS, type SweepIds } from "./screens";
import { findSweepIds } from "./sweep-ids";

/** Desktop, the tablet on the bench, a phone away from the desk. */
const WIDTHS = [
  { name: "desktop", width: 1360, height: 900 },
  { name: "tablet", width: 820, height: 1180 },
  { name: "phone", width: 390, height: 844 },
] as const;
// Up to 25 screens, three axe-core runs each, on a shared machine.
const SWEEP_TIMEOUT_MS = 600_000;
/** The role whose screens are photographed at the tablet and phone widths (it sees all four). */
const PHOTOGRAPHED_ROLE = "tech";

let ids: SweepIds;
beforeAll(async () => { ids = await findSweepIds(); });
afterAll(async () => { await sql.end({ timeout: 5 }); });

// One signed-in browser per role visits each of that role's screens once; axe-core checks it at each width.
describe.each(ALL_ROLES)("WCAG 2.1 AA sweep as %s", (role) => {
  let browser: Browser;
  const screens = SCREENS.filter((s) => may(role, s.capability));

  beforeAll(async () => {
    browser = await openBrowser();
    const signIn = new SignInPage(browser.page);
    await signIn.open();
    await signIn.signIn(`${role}@rootbench.test`);
    await browser.page.getByTestId(`home-${role}`).waitFor();
  });
  afterAll(async () => { await browser?.close(); });

  it("every screen at 1360, 820 and 390 px: no axe-core violations, no page wider than the screen, one header row, triage and bench controls 44 px or more", async () => {
    const { page } = browser;
    const found: Record<string, string[]> = {};
    for (const screen of screens) {
      await page.setViewportSize(WIDTHS[0]);
      const response = await page.goto(`${BASE_URL}${screen.path(ids)}`);
      expect(response?.status(), `${screen.name} answers`).toBe(200);
      await page.waitForLoadState("networkidle");
      if (screen.ready) await page.locator(screen.ready).first().waitFor();
      for (const { name, width, height } of WIDTHS) {
        await page.setViewportSize({ width, height });
        await afterLayout(page);
        const problems = await axeViolations(page);
        if (screen.touchArea) problems.push(...(await smallTargets(page, screen.touchArea)).map((t) => `target under 44 px: ${t}`));
        if (await headerOverflows(page)) problems.push("the header row overflows");
        const overflow = await pageOverflow(page);
        if (overflow) problems.push(`the page is wider than the screen (WCAG 1.4.10 Reflow): ${overflow}`);
        if (problems.length) found[`${screen.name} at ${width} px`] = problems;
        if (screen.photographed && role === PHOTOGRAPHED_ROLE && name !== "desktop") await screenshot(page, `a11y-${name}-${screen.name.replace(/ /g, "-")}`);
      }
    }
    expect(found).toEqual({});
    expect(browser.errors).toEqual([]);
  }, SWEEP_TIMEOUT_MS);
});

// A resize reaches React through ResizeObserver and media queries: let two frames pass.
// Bounded: a renderer that stops producing frames fails this screen in seconds with its name,
// instead of holding the whole sweep until the test's timeout.
async function afterLayout(page: Browser["page"]): Promise<void> {
  const framed = await page.evaluate(() => new Promise<boolean>((done) => {
    const timer = setTimeout(() => done(false), 5000);
    requestAnimationFrame(() => requestAnimationFrame(() => { clearTimeout(timer); done(true); }));
  }));
  if (!framed) throw new Error(`${page.url()} drew no frame within 5 s`);
}

// The header is one row: its content never needs more width than the row has, and it is one line tall.
function headerOverflows(page: Browser["page"]): Promise<boolean> {
  return page.locator("header > div").first().evaluate((row) => row.scrollWidth > row.clientWidth || row.getBoundingClientRect().height > 72);
}


/**
 * The page reflows to the screen's width (WCAG 1.4.10): only a box that scrolls sideways itself (a
 * wide table in its overflow-x-auto wrapper) may hold content wider than the screen. When the page
 * is wider, names the outermost elements that stick out past its right edge, to say where to look.
 */
function pageOverflow(page: Browser["page"]): Promise<string | null> {
  return page.evaluate(() => {
    const width = window.innerWidth;
    if (document.documentElement.scrollWidth <= width) return null;
    const name = (el: Element) => `${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ""}${el.getAttribute("data-testid") ? `[data-testid=${el.getAttribute("data-testid")}]` : ""}.${[...el.classList].slice(0, 4).join(".")}`;
    const culprits: string[] = [];
    const visit = (el: Element) => {
      if (el.getBoundingClientRect().right > width + 0.5) { culprits.push(`${name(el)} (${Math.round(el.getBoundingClientRect().right)} px)`); return; }
      for (const child of el.children) visit(child);
    };
    for (const child of document.body.children) visit(child);
    return `${document.documentElement.scrollWidth} px wide; sticking out: ${culprits.slice(0, 4).join(", ") || "?"}`;
  });
}
