import type { Page } from "playwright-core";
import { BASE_URL } from "../support/browser";

export class WriteupEditorPage {
  constructor(private readonly page: Page) {}

  async openNew(): Promise<void> {
    await this.page.goto(`${BASE_URL}/writeups/new`);
    await this.page.getByTestId("writeup-editor").waitFor();
  }

  async fill(values: { title: string; summary: string; body: string }): Promise<void> {
    await this.page.getByLabel("Title", { exact: true }).fill(values.title);
    await this.page.getByLabel("Summary", { exact: true }).fill(values.summary);
    await this.page.getByLabel("Body (Markdown)").fill(values.body);
  }

  /** Ticks the first entry of a picker (Motor families, Causes, Parts). */
  async pickFirst(legend: string): Promise<string> {
    const box = this.page.getByRole("group", { name: new RegExp(`^${legend}`) }).getByRole("checkbox").first();
    await box.check();
    return (await box.locator("xpath=..").innerText()).trim();
  }

  async uploadPhoto(file: string): Promise<void> {
    await this.page.getByTestId("photo-input").setInputFiles(file);
  }

  photoStatus() {
    return this.page.getByTestId("photo-status");
  }

  body() {
    return this.page.getByLabel("Body (Markdown)");
  }

  preview() {
    return this.page.getByTestId("writeup-preview");
  }

  async saveDraft(): Promise<void> {
    await this.page.getByRole("button", { name: /^Save draft/ }).click();
    await this.page.waitForURL(/\/writeups\/\d+\?saved=draft/);
  }
}
