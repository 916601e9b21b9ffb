import type { Page } from "playwright-core";

/** The walk screen: the current question, the answers so far, the suggestions and the finish form. */
export class TriageWalkPage {
  constructor(private readonly page: Page) {}

  async ready(): Promise<void> {
    await this.page.getByTestId("walk-screen").waitFor();
  }

  currentNode(): Promise<string | null> {
    return this.page.getByTestId("current-question").getAttribute("data-node");
  }

  async waitForQuestion(nodeKey: string): Promise<void> {
    await this.page.locator(`[data-testid="current-question"][data-node="${nodeKey}"]`).waitFor();
  }

  /** Waits until exactly `n` answers are shown: the trail holds only steps the server has stored. */
  async waitForConfirmedSteps(n: number): Promise<void> {
    await this.page.waitForFunction((count) => {
      const steps = document.querySelectorAll('[data-testid="trail-step"]');
      const screen = document.querySelector('[data-testid="walk-screen"]');
      return steps.length === count && screen?.getAttribute("data-pending") === "no";
    }, n);
  }

  /** Presses the number key of the answer whose label starts with `label`. */
  async answerWithKey(label: string): Promise<void> {
    const options = this.page.getByTestId("answer-option");
    const labels = await options.allTextContents();
    const index = labels.findIndex((t) => t.replace(/^\d/, "").trim().startsWith(label));
    if (index < 0 || index > 8) throw new Error(`no answer "${label}" among ${JSON.stringify(labels)}`);
    await this.page.keyboard.press(String(index + 1));
  }

  suggestions() {
    return this.page.getByTestId("suggestion");
  }

  async undoWithKey(): Promise<void> {
    await this.page.keyboard.press("u");
  }

  topCause(): Promise<string | null> {
    return this.page.getByTestId("ranked-cause").first().getAttribute("data-cause");
  }

  stopRidingBanner() {
    return this.page.getByTestId("stop-riding");
  }

  async bookIn(send: "The drive unit only" | "The drive unit and the battery" | "The whole bike, dropped off in person", note = ""): Promise<void> {
    const form = this.page.getByTestId("finish-form");
    await form.getByLabel("Book the unit in").check();
    await form.getByLabel(send).check();
    if (note) await form.getByLabel(/Note for the caller/).fill(note);
    await form.getByRole("button", { name: /^Book/ }).click();
  }
}
