import type { Page } from "playwright-core";
import { BASE_URL } from "../support/browser";

export interface NewCall {
  callerName: string;
  phone?: string;
  email?: string;
  family: string;
  serial?: string;
  ridingUse?: "road" | "trail" | "cargo" | "commuting";
  symptom: string;
  words?: string;
}

export class TriageNewPage {
  constructor(private readonly page: Page) {}

  async open(): Promise<void> {
    await this.page.goto(`${BASE_URL}/triage/new`);
    await this.page.getByTestId("new-case-form").waitFor();
  }

  async fill(call: NewCall): Promise<void> {
    const p = this.page;
    await p.getByLabel("Caller's name").fill(call.callerName);
    if (call.phone) await p.getByLabel("Phone").fill(call.phone);
    if (call.email) await p.getByLabel("E-mail address").fill(call.email);
    await p.getByLabel("Motor family").selectOption({ label: call.family });
    if (call.serial) await p.getByLabel("Serial number").fill(call.serial);
    if (call.ridingUse) await p.getByLabel("Riding use").selectOption(call.ridingUse);
    await p.getByTestId("tree-choices").getByText(call.symptom, { exact: true }).click();
    if (call.words) await p.getByLabel(/In the caller's words/).fill(call.words);
  }

  async start(): Promise<void> {
    await this.page.getByRole("button", { name: "Start the walk" }).click();
  }

  /** Opens the form, fills in the call, starts the walk and waits for its screen's address. */
  async startCall(call: NewCall): Promise<void> {
    await this.open();
    await this.fill(call);
    await this.start();
    await this.page.waitForURL(/\/triage\/\d+$/);
  }
}
