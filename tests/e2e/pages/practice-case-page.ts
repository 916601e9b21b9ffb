import type { Page } from "playwright-core";
import { BASE_URL } from "../support/browser";

export class PracticeCasePage {
  constructor(private readonly page: Page) {}

  async openList(): Promise<void> {
    await this.page.goto(`${BASE_URL}/practice`);
    await this.page.getByRole("heading", { name: "Practice cases" }).waitFor();
  }

  caseLinks() {
    return this.page.getByTestId("practice-case-link");
  }

  answers() {
    return this.page.getByTestId("practice-answer");
  }

  revealButton() {
    return this.page.getByRole("button", { name: /^Show what the (caller said|check showed)$/ });
  }

  rankingCaption() {
    return this.page.getByRole("region", { name: "The engine's ranking" }).locator("p").first();
  }

  /** Reveals every recorded answer, one at a time; returns how many there were. */
  async revealAll(): Promise<number> {
    let n = 0;
    while (await this.revealButton().isVisible()) {
      await this.revealButton().click();
      n++;
      await this.answers().nth(n - 1).waitFor();
    }
    return n;
  }

  async commitToFirstCause(): Promise<string> {
    const select = this.page.getByLabel("Your call: what did the bench find?");
    const first = (await select.locator("option:not([disabled])").first().textContent()) ?? "";
    await select.selectOption({ label: first });
    await this.page.getByRole("button", { name: "Commit to this cause" }).click();
    await this.page.getByTestId("practice-result").waitFor();
    return first;
  }
}
