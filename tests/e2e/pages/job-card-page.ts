import type { Page } from "playwright-core";
import { BASE_URL } from "../support/browser";

export class JobCardPage {
  constructor(private readonly page: Page) {}

  /** From the case page, as a technician would: the link beside the case title. */
  async openFromCase(caseId: number): Promise<void> {
    await this.page.goto(`${BASE_URL}/cases/${caseId}`);
    await this.page.getByTestId("job-card-link").click();
    await this.page.waitForURL(new RegExp(`/cases/${caseId}/job-card$`));
    await this.card().waitFor();
  }

  card() {
    return this.page.getByTestId("job-card");
  }

  reference() {
    return this.page.getByTestId("job-card-reference");
  }

  /** The bench plan's causes in the order printed. */
  benchPlanCauses(): Promise<string[]> {
    return this.card().getByTestId("bench-plan").locator("li").evaluateAll((els) => els.map((e) => e.getAttribute("data-cause") ?? ""));
  }

  /** What Chromium's "Save as PDF" would make of the page (print stylesheet, A4). */
  pdf(): Promise<Buffer> {
    return this.page.pdf({ format: "A4", printBackground: true, preferCSSPageSize: true });
  }
}
