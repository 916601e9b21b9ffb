import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SignInPage } from "../pages/sign-in-page";
import { BASE_URL, DEMO_PASSWORD, openBrowser, screenshot, type Browser } from "../support/browser";

const ROLES = ["admin", "lead", "senior", "tech", "trainee"] as const;

describe("sign in as each role", () => {
  let browser: Browser;
  beforeAll(async () => { browser = await openBrowser(); });
  afterAll(async () => { await browser.close(); });

  it("an empty form gets messages next to the fields", async () => {
    const signIn = new SignInPage(browser.page);
    await signIn.open();
    await browser.page.getByRole("button", { name: "Sign in" }).click();
    await browser.page.getByText("Enter your e-mail address.").waitFor();
    await browser.page.getByText("Enter your password.").waitFor();
    await screenshot(browser.page, "auth-sign-in-empty");
  });

  for (const role of ROLES) {
    it(`${role} signs in, sees the ${role} home, signs out`, async () => {
      const signIn = new SignInPage(browser.page);
      await signIn.open();
      if (role === "admin") await browser.page.getByTestId("demo-notice").waitFor();
      await signIn.signIn(`${role}@rootbench.test`);
      await browser.page.getByTestId(`home-${role}`).waitFor({ timeout: 15000 });
      expect(await browser.page.getByTestId("signed-in-as").textContent()).toMatch(/·/);
      await screenshot(browser.page, `auth-home-${role}`);
      await signIn.signOut();
      await browser.page.goto(`${BASE_URL}/`);
      await browser.page.waitForURL(/\/sign-in/);
    });
  }

  it("the browser saw no errors and no missing files", () => {
    expect(browser.errors).toEqual([]);
  });
});

describe("pages refuse roles that may not use them", () => {
  async function cookieFor(email: string): Promise<string> {
    const b = await openBrowser();
    try {
      const s = new SignInPage(b.page);
      await s.open();
      await s.signIn(email, DEMO_PASSWORD);
      await b.page.getByTestId(/home-/).first().waitFor();
      const cookie = (await b.context.cookies()).find((c) => c.name === "rb_session");
      return `rb_session=${cookie?.value}`;
    } finally {
      await b.close();
    }
  }

  it("a technician gets 403 on the people page; a lead gets it", async () => {
    const tech = await cookieFor("tech@rootbench.test");
    const forbidden = await fetch(`${BASE_URL}/users`, { headers: { cookie: tech }, redirect: "manual" });
    expect(forbidden.status).toBe(403);
    const lead = await cookieFor("lead@rootbench.test");
    const allowed = await fetch(`${BASE_URL}/users`, { headers: { cookie: lead }, redirect: "manual" });
    expect(allowed.status).toBe(200);
  });

  it("a signed-out visitor is sent to sign-in; the API answers 401", async () => {
    const page = await fetch(`${BASE_URL}/users`, { redirect: "manual" });
    expect([302, 303, 307, 308]).toContain(page.status);
    expect(page.headers.get("location")).toMatch(/\/sign-in/);
    const api = await fetch(`${BASE_URL}/api/session`);
    expect(api.status).toBe(401);
  });

  it("responses carry the security headers", async () => {
    const response = await fetch(`${BASE_URL}/sign-in`);
    expect(response.headers.get("x-content-type-options")).toBe("nosniff");
    expect(response.headers.get("content-security-policy")).toMatch(/frame-ancestors 'none'/);
    expect(response.headers.get("content-security-policy")).toMatch(/script-src 'self' 'nonce-[^']+' 'strict-dynamic'(;|$)/);
    // Plain HTTP here: no Strict-Transport-Security (it comes with COOKIE_SECURE=1).
    expect(response.headers.get("strict-transport-security")).toBeNull();
  });
});
