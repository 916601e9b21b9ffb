import type { Download, Page } from "playwright-core";
import { BASE_URL } from "../support/browser";

export class ReportPage {
  constructor(private readonly page: Page) {}

  async open(query = ""): Promise<void> {
    await this.page.goto(`${BASE_URL}/reports${query ? `?${query}` : ""}`);
    await this.page.getByTestId("reports-page").waitFor();
  }

  /** Follows a link in the reports' row of pages. */
  async goTo(label: "Causes" | "Tree accuracy" | "Parts and labour" | "Does the repair last?"): Promise<void> {
    await this.page.getByRole("navigation", { name: "Reports" }).getByRole("link", { name: label, exact: true }).click();
    await this.page.waitForFunction((l) => document.querySelector('nav[aria-label="Reports"] [aria-current=page]')?.textContent === l, label);
    await this.page.locator("main h1").waitFor();
  }

  scope() {
    return this.page.getByTestId("report-scope");
  }

  paretoRows() {
    return this.page.getByTestId("pareto-table").locator("tbody tr");
  }

  async choosePreset(months: 3 | 6 | 12 | 24): Promise<void> {
    await this.page.getByRole("navigation", { name: "Report period" }).getByRole("link", { name: `Last ${months} months` }).click();
    await this.page.waitForURL(new RegExp(`last=${months}`));
    await this.page.getByTestId("reports-page").waitFor();
  }

  async chooseFamily(label: string): Promise<void> {
    const form = this.page.getByRole("form", { name: "Motor family" });
    await form.getByLabel("Motor family").selectOption({ label });
    await form.getByRole("button", { name: "Show" }).click();
    await this.page.waitForURL(/family=/);
    await this.page.getByTestId("reports-page").waitFor();
  }

  async exportCsv(): Promise<Download> {
    const [download] = await Promise.all([this.page.waitForEvent("download"), this.page.getByTestId("export-csv").click()]);
    return download;
  }
}
