import type { Page } from "playwright-core";
import { BASE_URL } from "../support/browser";

export class WriteupSearchPage {
  constructor(private readonly page: Page) {}

  async open(query?: string): Promise<void> {
    await this.page.goto(`${BASE_URL}/writeups${query ? `?q=${encodeURIComponent(query)}` : ""}`);
    await this.ready();
  }

  /** The index has arrived and been built: the status line counts the write-ups. */
  async ready(): Promise<void> {
    await this.status().filter({ hasText: /of \d+ write-ups/ }).waitFor({ timeout: 60000 });
  }

  input() {
    return this.page.getByRole("main").getByRole("searchbox", { name: "Search write-ups" });
  }

  status() {
    return this.page.getByTestId("search-status");
  }

  results() {
    return this.page.getByTestId("search-results").getByRole("listitem");
  }

  /** The "Show N more" button under the results. */
  more() {
    return this.page.getByTestId("search-more");
  }

  async type(text: string): Promise<void> {
    await this.input().fill("");
    await this.input().pressSequentially(text, { delay: 40 });
    await this.status().filter({ hasText: `for “${text}”` }).waitFor();
  }

  async searchFromHeader(text: string): Promise<void> {
    const box = this.page.getByRole("searchbox", { name: "Search write-ups" }).first();
    await box.fill(text);
    await box.press("Enter");
    await this.page.waitForURL(/\/writeups\?q=/);
    await this.ready();
  }
}
