import type { Page } from "playwright-core";

export class SetupPage {
  constructor(private readonly page: Page, private readonly baseUrl: string) {}

  async open(): Promise<void> {
    await this.page.goto(`${this.baseUrl}/setup`);
  }

  async createAdmin(name: string, email: string, password: string, shop: { name: string; email: string }): Promise<void> {
    await this.page.getByLabel("Your name").fill(name);
    await this.page.getByLabel("Your e-mail address").fill(email);
    await this.page.getByLabel("Password", { exact: true }).fill(password);
    await this.page.getByLabel("Repeat it").fill(password);
    await this.page.getByLabel("Workshop name").fill(shop.name);
    await this.page.getByLabel("Workshop e-mail address").fill(shop.email);
    await this.page.getByRole("button", { name: "Create the administrator account" }).click();
  }
}
