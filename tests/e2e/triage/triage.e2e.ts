import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SignInPage } from "../pages/sign-in-page";
import { TriageNewPage } from "../pages/triage-new-page";
import { TriageWalkPage } from "../pages/triage-walk-page";
import { BASE_URL, openBrowser, screenshot, type Browser } from "../support/browser";

// npm test starts the fake SMTP server and hands its control port over here.
const SMTP_CONTROL = process.env.E2E_SMTP_CONTROL ?? "http://127.0.0.1:2627";

interface Captured { subject: string; envelopeTo: string[]; text: string; html: string }

async function waitForMail(to: string, timeoutMs = 20000): Promise<Captured> {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    const messages = (await (await fetch(`${SMTP_CONTROL}/messages`)).json()) as Captured[];
    const hit = messages.find((m) => m.envelopeTo.includes(to));
    if (hit) return hit;
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`no message to ${to} reached the fake SMTP server`);
}

// A screenshot taken before hydration ends makes React report the caret style it injects as a mismatch.
async function shot(page: Browser["page"], name: string): Promise<void> {
  await page.waitForLoadState("networkidle");
  await screenshot(page, name);
}

// The dev server's hot-reload socket is refused from 127.0.0.1; that noise is not ours.
const realErrors = (errors: string[]) => errors.filter((e) => !/_next\/hmr|WebSocket/.test(e));

describe("phone triage, end to end", () => {
  let browser: Browser;
  const email = `pim-${Date.now().toString(36)}@example.test`;
  let reference = "";

  beforeAll(async () => { browser = await openBrowser(); });
  afterAll(async () => { await browser.close(); });

  it("a technician starts a case, answers with the keyboard, jumps to a suggestion, undoes and books the unit in", async () => {
    const { page } = browser;
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn("tech@rootbench.test");
    await page.getByTestId("home-tech").waitFor();

    const form = new TriageNewPage(page);
    await form.open();
    await form.fill({
      callerName: "Pim Ostrander", phone: "+00 555 0199 4411", email, family: "Orvanta Tessel Gen 2",
      serial: "TS2-88120", ridingUse: "trail", symptom: "Pedals slip or no drive", words: "the pedals drop forward on a steep climb",
    });
    await shot(page, "triage-new-filled");
    await form.start();
    await page.waitForURL(/\/triage\/\d+$/);

    const walk = new TriageWalkPage(page);
    await walk.ready();
    reference = (await page.getByTestId("case-reference").textContent()) ?? "";
    expect(reference).toMatch(/^[A-Z]{2}-\d{4}-\d{4}$/);
    await walk.waitForQuestion("q-what");

    await walk.answerWithKey("Pedals spin forward");
    await walk.waitForConfirmedSteps(1);
    // The stop-riding caution node of this tree has been passed, and the clutch causes lead.
    await walk.stopRidingBanner().waitFor();
    await page.getByText("Stop riding: slipping or jamming drive", { exact: true }).waitFor();
    await walk.waitForQuestion("q-onset");
    await walk.answerWithKey("Suddenly");
    await walk.waitForConfirmedSteps(2);

    // Jump to a suggested question that is not the one the tree would ask next.
    const current = await walk.currentNode();
    const suggested = await walk.suggestions().evaluateAll((els) => els.map((e) => e.getAttribute("data-node")));
    const jumpTo = suggested.find((k) => k && k !== current)!;
    expect(jumpTo).toBeTruthy();
    await walk.suggestions().and(page.locator(`[data-node="${jumpTo}"]`)).click();
    await walk.waitForQuestion(jumpTo);
    const jumpedTitle = (await page.locator("#current-question").textContent()) ?? "";
    await page.keyboard.press("1");
    await walk.waitForConfirmedSteps(3);
    expect(await page.getByTestId("trail-step").nth(2).textContent()).toContain(jumpedTitle);
    await shot(page, "triage-walk-three-answers");

    await walk.undoWithKey();
    await walk.waitForConfirmedSteps(2);
    expect(await page.getByTestId("ranked-cause").count()).toBeGreaterThan(3);
    expect(await walk.topCause()).toBe("owc-cage-broken");
    await shot(page, "triage-walk-after-undo");

    // Notes save on their own shortly after typing stops.
    await page.getByTestId("case-notes").pressSequentially(" Rider weighs the bike down with a child seat.");
    await page.getByTestId("notes-status").filter({ hasText: /^Saved at/ }).waitFor();

    await walk.bookIn("The drive unit and the battery", "Please add the crank arms.");
    await page.waitForURL(/\/cases\/\d+\?finished=1$/);
    await page.getByTestId("finished-note").waitFor();
    expect(await page.getByTestId("case-status").getAttribute("data-status")).toBe("booked_in");
    expect(await page.getByTestId("case-step").count()).toBe(2);
    expect(await page.getByTestId("case-notes-view").textContent()).toContain("child seat");
    await shot(page, "triage-case-booked-in");
  });

  it("the fake SMTP server holds the summary e-mail", async () => {
    const mail = await waitForMail(email);
    expect(mail.subject).toBe(`${reference}: your Orvanta Tessel Gen 2 drive unit is booked in`);
    expect(mail.text).toMatch(/PLEASE STOP RIDING/);
    expect(mail.text).toMatch(/One-way clutch cage broken: about \d+\u00a0% likely/);
    expect(mail.text).toMatch(/ROUGH QUOTE\n- €\d+ to €\d+/);
    expect(mail.text).toMatch(/dangerous goods/);
    expect(mail.html).toMatch(/<h3>How to send the unit<\/h3>/);
  });

  it("the case shows in the case table and its message on the outbox", async () => {
    const { page } = browser;
    await page.goto(`${BASE_URL}/cases?q=${encodeURIComponent(reference)}`);
    await page.getByTestId("case-row").first().waitFor();
    expect(await page.getByTestId("case-row").count()).toBe(1);
    expect(await page.getByTestId("case-row").first().textContent()).toContain("booked in");
    await shot(page, "triage-cases-table");
    await new SignInPage(page).signOut();
    await new SignInPage(page).signIn("lead@rootbench.test");
    await page.getByTestId("home-lead").waitFor();
    await page.goto(`${BASE_URL}/outbox`);
    const row = page.getByTestId("outbox-row").filter({ hasText: email });
    await row.waitFor();
    expect(await row.getByTestId("mail-status").textContent()).toBe("sent");
    await shot(page, "triage-outbox");
  });

  it("a key pressed the moment an answer is confirmed is taken, not dropped as still pending", async () => {
    const { page } = browser;
    await page.context().clearCookies();
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn("tech@rootbench.test");
    await page.getByTestId("home-tech").waitFor();
    await new TriageNewPage(page).startCall({
      callerName: "Ines Varda", phone: "+00 555 0199 4412", family: "Orvanta Tessel Gen 2",
      ridingUse: "road", symptom: "Pedals slip or no drive", words: "slips under load",
    });
    const walk = new TriageWalkPage(page);
    await walk.ready();
    await walk.waitForQuestion("q-what");
    // The second key goes in from inside the commit that shows the first answer's step (a mutation
    // observer runs before the browser paints), the earliest a fast typist's key can arrive.
    await page.evaluate(() => {
      let sent = false;
      new MutationObserver(() => {
        if (sent || !document.querySelector("[data-testid=trail-step]")) return;
        sent = true;
        window.dispatchEvent(new KeyboardEvent("keydown", { key: "1", bubbles: true }));
      }).observe(document.querySelector("[data-testid=walk-screen]")!, { childList: true, subtree: true });
    });
    await walk.answerWithKey("Pedals spin forward");
    await walk.waitForConfirmedSteps(2);
    expect(await page.getByTestId("walk-error").count()).toBe(0);
  });

  it("the browser saw no errors", () => {
    expect(realErrors(browser.errors)).toEqual([]);
  });
});
