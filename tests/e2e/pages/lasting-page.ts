import type { Page } from "playwright-core";
import { BASE_URL } from "../support/browser";

/** "Does the repair last?": filters, then one card per upgrade with its verdict, p-value and tables. */
export class LastingPage {
  constructor(private readonly page: Page) {}

  async openFromReports(): Promise<void> {
    await this.page.goto(`${BASE_URL}/reports`);
    await this.page.getByRole("link", { name: /Does the repair last\?/ }).click();
    await this.page.getByTestId("lasting-page").waitFor();
  }

  scope() {
    return this.page.getByTestId("lasting-scope");
  }

  async filter(choice: { family?: string; use?: string }): Promise<void> {
    const form = this.page.getByRole("form", { name: "Which repairs" });
    if (choice.family) await form.getByLabel("Motor family").selectOption({ label: choice.family });
    if (choice.use) await form.getByLabel("Riding use").selectOption(choice.use);
    await form.getByRole("button", { name: "Show" }).click();
    await this.page.waitForURL(/family=/);
    await this.page.getByTestId("lasting-page").waitFor();
  }

  comparison(upgrade: string) {
    return this.page.locator(`[data-testid="comparison"][data-upgrade="${upgrade}"]`);
  }

  verdicts() {
    return this.page.getByTestId("comparison");
  }
}
