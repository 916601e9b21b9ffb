import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PeoplePage } from "../pages/people-page";
import { SetPasswordPage } from "../pages/set-password-page";
import { SetupPage } from "../pages/setup-page";
import { SignInPage } from "../pages/sign-in-page";
import { openBrowser, screenshot, type Browser } from "../support/browser";
import { waitForMail } from "../support/fake-mail";

// A second production server on an empty database started with ROOTBENCH_DEMO=0 (scripts/test.sh).
const FRESH = process.env.E2E_FRESH_BASE_URL;
const SMTP_CONTROL = process.env.E2E_SMTP_CONTROL ?? "http://127.0.0.1:2627";

describe.skipIf(!FRESH)("a shop of its own: setup, invitation, first sign-in", () => {
  const base = FRESH!;
  let admin: Browser;
  let tech: Browser;
  const adminEmail = "owner@fresh-shop.rootbench.test";
  const techEmail = `tech-${Date.now().toString(36)}@fresh-shop.rootbench.test`;

  beforeAll(async () => {
    admin = await openBrowser();
    tech = await openBrowser();
  });
  afterAll(async () => {
    await admin?.close();
    await tech?.close();
  });

  it("the first visit leads to /setup, with no demo notice and no demo account", async () => {
    await admin.page.goto(`${base}/`);
    await admin.page.waitForURL(/\/setup$/);
    await admin.page.getByRole("heading", { name: "Set up your shop" }).waitFor();
    await screenshot(admin.page, "fresh-shop-1-setup");
  });

  it("the page carries a nonce Content-Security-Policy with no 'unsafe-inline' for scripts", async () => {
    const response = await fetch(`${base}/setup`);
    const csp = response.headers.get("content-security-policy") ?? "";
    const scripts = csp.split(";").map((d) => d.trim()).find((d) => d.startsWith("script-src")) ?? "";
    expect(scripts).toMatch(/'nonce-[A-Za-z0-9+/=]+'/);
    expect(scripts).not.toContain("'unsafe-inline'");
    const html = await response.text();
    const nonce = /'nonce-([^']+)'/.exec(scripts)![1];
    expect(html).toContain(`nonce="${nonce}"`);
  });

  it("setup creates the administrator, who lands on the people page", async () => {
    await new SetupPage(admin.page, base).createAdmin("Rowan Fettle", adminEmail, "brass ratchet lighthouse", { name: "Fettle Drive Works", email: "desk@fresh-shop.rootbench.test" });
    await admin.page.waitForURL(/\/users\?welcome=1/);
    await admin.page.getByText("Your shop is set up").waitFor();
    await screenshot(admin.page, "fresh-shop-2-people");
    // Closed for good now.
    const again = await fetch(`${base}/setup`);
    expect(await again.text()).toContain("Already set up");
  });

  it("the administrator invites a technician; the invitation goes through the outbox", async () => {
    const people = new PeoplePage(admin.page, base);
    await people.invite("Sami Cogsworth", techEmail, "Technician");
    await admin.page.getByText(`Invitation sent to ${techEmail}`).waitFor();
    await people.row(techEmail).getByText("invited, no password yet").waitFor();
    await screenshot(admin.page, "fresh-shop-3-invited");
  });

  it("the technician reads the mail, sets a password once and signs in", async () => {
    const mail = await waitForMail(SMTP_CONTROL, techEmail);
    expect(mail.subject).toBe("Your Rootbench account");
    // Sent as the shop entered at setup, though its mail worker was started before the shop existed.
    expect(mail.from).toBe("Fettle Drive Works <desk@fresh-shop.rootbench.test>");
    const link = /(https?:\/\/\S+\/invite\?token=\S+)/.exec(mail.text)![1];
    expect(link.startsWith(`${base}/invite?token=`)).toBe(true);

    const setPassword = new SetPasswordPage(tech.page);
    await setPassword.open(link);
    await tech.page.getByRole("heading", { name: "Welcome, Sami Cogsworth" }).waitFor();
    await screenshot(tech.page, "fresh-shop-4-invitation");
    await setPassword.choose("oily chain sunrise");
    await tech.page.waitForURL(/\/sign-in\?password=set/);
    await tech.page.getByText("Your password is set").waitFor();
    expect(await tech.page.getByTestId("demo-notice").count()).toBe(0);

    await new SignInPage(tech.page, base).signIn(techEmail, "oily chain sunrise");
    await tech.page.getByTestId("home-tech").waitFor({ timeout: 15000 });
    await screenshot(tech.page, "fresh-shop-5-tech-home");

    // The link is dead now.
    await setPassword.open(link);
    await setPassword.problem().waitFor();
    await screenshot(tech.page, "fresh-shop-6-used-link");
  });

  it("the technician's account page changes the password and signs out everywhere", async () => {
    await tech.page.goto(`${base}/`);
    await tech.page.getByTestId("signed-in-as").click();
    await tech.page.waitForURL(/\/account$/);
    await tech.page.getByLabel("Current password").fill("oily chain sunrise");
    await tech.page.getByLabel("New password").fill("quiet freewheel harbour");
    await tech.page.getByLabel("Repeat it").fill("quiet freewheel harbour");
    await tech.page.getByRole("button", { name: "Change password" }).click();
    await tech.page.getByText("Password changed. You are signed out everywhere else.").waitFor();
    await screenshot(tech.page, "fresh-shop-7-account");
    await tech.page.getByRole("button", { name: "Sign out everywhere" }).click();
    await tech.page.waitForURL(/\/sign-in/);
  });

  it("the browsers saw no errors (the CSP blocked nothing of ours)", () => {
    expect(admin.errors).toEqual([]);
    expect(tech.errors).toEqual([]);
  });
});
