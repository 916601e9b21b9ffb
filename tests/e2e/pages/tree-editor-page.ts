import type { Page } from "playwright-core";
import { BASE_URL } from "../support/browser";

/** The tree editor at /trees/[id]/edit: canvas, toolbar, side panel, save bar. */
export class TreeEditorPage {
  constructor(private readonly page: Page) {}

  async open(treeId: number): Promise<void> {
    await this.page.goto(`${BASE_URL}/trees/${treeId}/edit`);
    await this.waitReady();
  }

  async waitReady(timeout = 60_000): Promise<void> {
    await this.page.locator('[data-testid="tree-canvas"][data-canvas-ready="true"]').waitFor({ timeout });
  }

  node(key: string) {
    return this.page.getByTestId(`rf__node-${key}`);
  }

  nodeKeys(): Promise<string[]> {
    return this.page.locator(".react-flow__node").evaluateAll((els) => els.map((e) => e.getAttribute("data-id") ?? ""));
  }

  async addNode(kind: "Question" | "Check" | "Cause" | "Caution"): Promise<string> {
    const before = new Set(await this.nodeKeys());
    await this.page.getByRole("toolbar", { name: "Canvas" }).getByRole("button", { name: kind, exact: true }).click();
    await this.page.waitForFunction((n) => document.querySelectorAll(".react-flow__node").length > n, before.size);
    return (await this.nodeKeys()).find((k) => !before.has(k))!;
  }

  async selectNode(key: string): Promise<void> {
    await this.node(key).click();
    await this.page.getByTestId("node-form").waitFor();
  }

  nodeForm() {
    return this.page.getByTestId("node-form");
  }

  optionForm() {
    return this.page.getByTestId("option-form");
  }

  /** Waits until the viewport has stopped moving (fit and layout animate for a moment). */
  async waitStill(): Promise<void> {
    const transform = () => this.page.locator(".react-flow__viewport").getAttribute("style");
    let last = await transform();
    for (let i = 0; i < 50; i++) {
      await this.page.waitForTimeout(150);
      const now = await transform();
      if (now === last) return;
      last = now;
    }
  }

  async autoLayout(): Promise<void> {
    await this.page.getByRole("button", { name: "Auto layout" }).click();
    await this.page.waitForTimeout(100);
    await this.waitStill();
  }

  /** Drags from a node's answer handle onto another node's top handle: one new answer. */
  async connect(fromKey: string, toKey: string): Promise<void> {
    await this.waitStill();
    const source = this.page.locator(`.react-flow__handle.source[data-nodeid="${fromKey}"]`);
    const target = this.page.locator(`.react-flow__handle.target[data-nodeid="${toKey}"]`);
    const a = (await source.boundingBox())!;
    const b = (await target.boundingBox())!;
    await this.page.mouse.move(a.x + a.width / 2, a.y + a.height / 2);
    await this.page.mouse.down();
    await this.page.mouse.move((a.x + b.x) / 2, (a.y + b.y) / 2, { steps: 8 });
    await this.page.mouse.move(b.x + b.width / 2, b.y + b.height / 2, { steps: 8 });
    await this.page.mouse.up();
    await this.optionForm().waitFor();
  }

  async setStrength(causeName: string, word: "rules out" | "against" | "neutral" | "for" | "strong"): Promise<void> {
    await this.optionForm().getByRole("radiogroup", { name: `Evidence for ${causeName}` }).getByRole("radio", { name: word, exact: true }).click();
  }

  problemsTab() {
    return this.page.getByRole("tab", { name: /^Problems \(\d+\)$/ });
  }

  async problemCount(): Promise<number> {
    const text = (await this.problemsTab().textContent()) ?? "";
    return Number(/\((\d+)\)/.exec(text)?.[1] ?? NaN);
  }

  status() {
    return this.page.getByTestId("editor-status");
  }

  async save(): Promise<string> {
    await this.page.getByRole("button", { name: "Save draft" }).click();
    await this.page.waitForFunction(() => {
      const t = document.querySelector('[data-testid="editor-status"]')?.textContent ?? "";
      return t !== "" && t !== "Saving…";
    });
    return (await this.status().textContent()) ?? "";
  }

  async publish(note: string): Promise<void> {
    await this.page.getByRole("button", { name: "Publish…" }).click();
    await this.page.getByLabel("What changed").fill(note);
    await this.page.getByRole("button", { name: /^Publish version \d+$/ }).click();
  }
}
