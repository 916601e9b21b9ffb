import type { Page } from "playwright-core";
import { BASE_URL, DEMO_PASSWORD } from "../support/browser";

export class SignInPage {
  constructor(private readonly page: Page, private readonly baseUrl = BASE_URL) {}

  async open(): Promise<void> {
    await this.page.goto(`${this.baseUrl}/sign-in`);
  }

  async signIn(email: string, password = DEMO_PASSWORD): Promise<void> {
    await this.page.getByLabel("E-mail address").fill(email);
    await this.page.getByLabel("Password", { exact: true }).fill(password);
    await this.page.getByRole("button", { name: "Sign in" }).click();
  }

  message() {
    return this.page.getByTestId("sign-in-message");
  }

  async signOut(): Promise<void> {
    const button = this.page.getByRole("button", { name: "Sign out" });
    // On a narrow screen, or with a navigation too long for the row, the account sits in the menu.
    if (!(await button.isVisible())) await this.page.getByTestId("menu-button").click();
    await button.click();
    await this.page.waitForURL(/\/sign-in/);
  }
}
