import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sql } from "@/db";
import { ALL_ROLES, may } from "@/lib/auth/roles";
import { SignInPage } from "../pages/sign-in-page";
import { axeViolations } from "../support/axe";
import { BASE_URL, openBrowser, type Browser } from "../support/browser";
import { SCREENS, type SweepIds } from "./screens";
import { findSweepIds } from "./sweep-ids";

/** Desktop, the tablet on the bench, a phone away from the desk. */
export const WIDTHS = [
  { name: "desktop", width: 1360, height: 900 },
  { name: "tablet", width: 820, height: 1180 },
  { name: "phone", width: 390, height: 844 },
] as const;

let ids: SweepIds;
beforeAll(async () => { ids = await findSweepIds(); });
afterAll(async () => { await sql.end({ timeout: 5 }); });

// One signed-in browser per role; each width visits that role's screens once and axe-core checks each.
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

  it.each(WIDTHS)("$name ($width px): every screen has no axe-core violations", async ({ width, height }) => {
    const { page } = browser;
    await page.setViewportSize({ width, height });
    const found: Record<string, string[]> = {};
    for (const screen of screens) {
      const response = await page.goto(`${BASE_URL}${screen.path(ids)}`);
      expect(response?.status(), `${screen.name} answers`).toBe(200);
      await page.waitForLoadState("networkidle");
      if (screen.ready) await page.locator(screen.ready).first().waitFor();
      const violations = await axeViolations(page);
      if (violations.length) found[screen.name] = violations;
    }
    expect(found).toEqual({});
    expect(browser.errors).toEqual([]);
  });
});
