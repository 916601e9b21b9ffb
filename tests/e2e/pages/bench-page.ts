import type { Locator, Page } from "playwright-core";
import { BASE_URL } from "../support/browser";

export type FindingResult = "found" | "not_found" | "not_done";

/** The teardown checklist of one case. */
export class BenchPage {
  constructor(private readonly page: Page) {}

  async open(caseId: number): Promise<void> {
    await this.page.goto(`${BASE_URL}/cases/${caseId}/bench`);
    await this.page.getByTestId("bench-page").waitFor();
  }

  steps(): Locator {
    return this.page.getByTestId("checklist-step");
  }

  step(cause: string): Locator {
    return this.page.locator(`[data-testid="checklist-step"][data-cause="${cause}"]`);
  }

  async stepCauses(): Promise<string[]> {
    return this.steps().evaluateAll((els) => els.map((e) => e.getAttribute("data-cause") ?? ""));
  }

  async minutesLeft(): Promise<number> {
    const text = (await this.page.getByTestId("minutes-left").locator("span").first().textContent()) ?? "";
    return Number(text.trim());
  }

  async probabilityOf(cause: string): Promise<number> {
    return Number(await this.page.locator(`[data-testid="bench-ranked"][data-cause="${cause}"]`).getAttribute("data-probability"));
  }

  /** Records a result on a checklist step (with a photo when given) and waits for it to show as recorded. */
  async record(cause: string, result: FindingResult, photo?: { name: string; mimeType: string; buffer: Buffer }): Promise<void> {
    const step = this.step(cause);
    if (photo) await step.getByTestId("finding-photo").setInputFiles(photo);
    await step.getByTestId(`record-${result}`).click();
    await this.page.locator(`[data-testid="recorded-finding"][data-cause="${cause}"][data-result="${result}"]`).waitFor();
  }

  companions(): Locator {
    return this.page.getByTestId("companion");
  }

  async acceptCompanion(cause: string): Promise<void> {
    await this.page.locator(`[data-testid="companion"][data-cause="${cause}"]`).getByTestId("accept-companion").click();
  }

  async finish(): Promise<void> {
    await this.page.getByTestId("finish-bench").click();
    await this.page.getByTestId("bench-finish").waitFor();
  }
}
