import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SignInPage } from "../pages/sign-in-page";
import { TreeEditorPage } from "../pages/tree-editor-page";
import { BASE_URL, openBrowser, screenshot, type Browser } from "../support/browser";

// Two causes from the demo catalogue, as the cause picker lists them.
const CAUSE_A = "Crank bearing worn, drive side";
const CAUSE_B = "Crank bearing worn, non-drive side";

describe("a senior mechanic builds a tree from nothing", () => {
  let browser: Browser;
  let editor: TreeEditorPage;
  const slug = `crank-creak-${Date.now().toString(36)}`;

  beforeAll(async () => {
    browser = await openBrowser();
    editor = new TreeEditorPage(browser.page);
    const signIn = new SignInPage(browser.page);
    await signIn.open();
    await signIn.signIn("senior@rootbench.test");
    await browser.page.getByTestId("home-senior").waitFor({ timeout: 30_000 });
  });
  afterAll(async () => { await browser.close(); });

  it("starts a tree on the trees page and lands in an empty editor", async () => {
    const page = browser.page;
    await page.goto(`${BASE_URL}/trees`);
    const form = page.getByRole("form", { name: "Start a tree" });
    await form.getByLabel("Reported symptom").fill("Creak from the crank when pedalling");
    await form.getByLabel("Title").fill("Creak or knock at the crank under load");
    await form.getByLabel("Slug").fill(slug);
    await form.getByRole("button", { name: "Create and open the editor" }).click();
    await page.waitForURL(/\/trees\/\d+\/edit$/, { timeout: 30_000 });
    await editor.waitReady();
    expect(await editor.nodeKeys()).toEqual([]);
  });

  it("adds a question with one answer to a cause node, and sees the problems on the canvas", async () => {
    const q = await editor.addNode("Question");
    await editor.nodeForm().getByLabel("Title").fill("Which side creaks?");
    await editor.nodeForm().getByLabel("Wording for the caller").fill("Stand on the pedals: does the creak come from the chain side or the other side?");

    const causeA = await editor.addNode("Cause");
    await editor.nodeForm().getByLabel("Title").fill("Drive-side bearing");
    await editor.nodeForm().getByLabel("Advice when this is the finding").fill("Replace the drive-side crank bearing and its seal.");
    await editor.nodeForm().getByLabel("Catalogue cause").selectOption({ label: CAUSE_A });

    const causeB = await editor.addNode("Cause");
    await editor.nodeForm().getByLabel("Title").fill("Non-drive-side bearing");
    await editor.nodeForm().getByLabel("Advice when this is the finding").fill("Replace the non-drive-side crank bearing and its seal.");
    await editor.nodeForm().getByLabel("Catalogue cause").selectOption({ label: CAUSE_B });

    await editor.autoLayout();
    await editor.connect(q, causeA);
    await editor.optionForm().getByLabel("Answer label").fill("Chain side");
    await editor.setStrength(CAUSE_A, "strong");
    await editor.setStrength(CAUSE_B, "against");
    await editor.optionForm().getByTestId("score-preview").waitFor();
    // The strong cause's bar is drawn to its share of the width (a "42 %" with a space is not CSS and drew nothing).
    const barWidths = await editor.optionForm().getByTestId("score-bar").evaluateAll((bars) => bars.map((el) => el.getBoundingClientRect().width));
    expect(Math.max(...barWidths)).toBeGreaterThan(10);

    // One answer only: the question needs two, and the second cause cannot be reached.
    await expect.poll(() => editor.problemCount()).toBe(2);
    await editor.node(q).getByTestId("node-problem-badge").waitFor();
    await editor.node(causeB).getByTestId("node-problem-badge").waitFor();
    expect(await editor.save()).toMatch(/^Draft saved\. 2 problems to fix before publishing\.$/);
    await editor.problemsTab().click();
    await screenshot(browser.page, "trees-editor-problems");
    expect(await browser.page.getByRole("button", { name: "Publish…" }).isDisabled()).toBe(true);
  });

  it("fixes the problem with a second answer, saves, and publishes", async () => {
    const [q, , causeB] = await editor.nodeKeys();
    await editor.connect(q, causeB);
    await editor.optionForm().getByLabel("Answer label").fill("Other side");
    await editor.setStrength(CAUSE_A, "against");
    await editor.setStrength(CAUSE_B, "strong");
    await expect.poll(() => editor.problemCount()).toBe(0);
    await screenshot(browser.page, "trees-editor-evidence");

    expect(await editor.save()).toBe("Draft saved. No problems: ready to publish.");
    await editor.publish("First edition");
    await browser.page.waitForURL(/\/trees\/\d+\?published=1$/, { timeout: 30_000 });
    await browser.page.getByText("Version 1 is published.").waitFor();
    await browser.page.getByTestId("tree-outline").getByText("Which side creaks?").waitFor();
    await screenshot(browser.page, "trees-published");
  });

  it("the browser saw no errors", () => {
    expect(browser.errors.filter((e) => !/WebSocket|_next\/hmr/.test(e))).toEqual([]);
  });
});
