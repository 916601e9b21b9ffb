import { readFileSync } from "node:fs";
import type { Page } from "playwright-core";
import type { AxeResults, Result } from "axe-core";

const AXE_SOURCE = readFileSync(require.resolve("axe-core/axe.min.js"), "utf8");

/** The WCAG 2.1 levels A and AA rules of axe-core; best-practice rules are left to review. */
const WCAG_21_AA = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];

/** Runs axe-core in the page and returns its violations, one readable line per element. */
export async function axeViolations(page: Page): Promise<string[]> {
  if (!(await page.evaluate(() => "axe" in window))) await page.addScriptTag({ content: AXE_SOURCE });
  const results = await page.evaluate(
    (tags) => (window as unknown as { axe: { run: (c: Document, o: object) => Promise<AxeResults> } }).axe
      .run(document, { runOnly: { type: "tag", values: tags }, resultTypes: ["violations"] }),
    WCAG_21_AA,
  );
  return results.violations.flatMap(describe);
}

function describe(v: Result): string[] {
  return v.nodes.map((n) => `${v.id} (${v.impact}) ${n.target.join(" ")}: ${n.failureSummary?.split("\n").slice(1).join(" ").trim()}  ${n.html.slice(0, 160)}`);
}
