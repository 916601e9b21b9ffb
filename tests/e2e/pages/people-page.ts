import type { Page } from "playwright-core";

export class PeoplePage {
  constructor(private readonly page: Page, private readonly baseUrl: string) {}

  async open(): Promise<void> {
    await this.page.goto(`${this.baseUrl}/users`);
  }

  async invite(name: string, email: string, roleLabel: string): Promise<void> {
    await this.page.getByLabel("Name", { exact: true }).fill(name);
    await this.page.getByLabel("E-mail address").fill(email);
    await this.page.getByLabel("Role", { exact: true }).selectOption({ label: roleLabel });
    await this.page.getByRole("button", { name: "Send invitation" }).click();
  }

  row(email: string) {
    return this.page.getByTestId(`user-${email}`);
  }
}
