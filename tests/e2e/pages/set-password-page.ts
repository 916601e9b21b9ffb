import type { Page } from "playwright-core";

/** The page an invitation or reset link opens. */
export class SetPasswordPage {
  constructor(private readonly page: Page) {}

  async open(link: string): Promise<void> {
    await this.page.goto(link);
  }

  async choose(password: string): Promise<void> {
    await this.page.getByLabel("Choose a password").fill(password);
    await this.page.getByLabel("Repeat it").fill(password);
    await this.page.getByRole("button", { name: "Set my password" }).click();
  }

  problem() {
    return this.page.getByTestId("link-problem");
  }
}
