import type { Locator, Page } from "playwright-core";
import { BASE_URL } from "../support/browser";

/** The evidence review panel on a tree's page. */
export class EvidenceReviewPage {
  constructor(private readonly page: Page) {}

  async openTree(title: string): Promise<void> {
    await this.page.goto(`${BASE_URL}/trees`);
    await this.page.getByRole("link", { name: title, exact: true }).first().click();
    await this.page.waitForURL(/\/trees\/\d+$/);
    await this.panel().waitFor({ timeout: 20000 });
  }

  panel(): Locator {
    return this.page.getByTestId("evidence-suggestions");
  }

  inUse(): Locator {
    return this.page.getByTestId("likelihoods-in-use");
  }

  /** The first suggestion that can still be written into the draft. */
  firstOpen(): Locator {
    return this.panel().getByTestId("suggestion").filter({ has: this.page.getByRole("button", { name: /in the draft$/ }) }).first();
  }

  async accept(suggestion: Locator): Promise<void> {
    await suggestion.getByRole("button", { name: /in the draft$/ }).click();
  }
}
