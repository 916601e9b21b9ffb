import type { Page } from "playwright-core";

/** WCAG 2.1 2.5.5 (Target Size, AAA): 44 by 44 CSS pixels; our triage and bench screens hold to it. */
export const MIN_TARGET_PX = 44;

/**
 * Every visible control in the area smaller than 44 × 44 px. A checkbox or radio is
 * measured by the label that wraps it (the area that takes the tap); links inside running text are
 * exempt, as in the WCAG criterion.
 */
export async function smallTargets(page: Page, area = "main"): Promise<string[]> {
  return page.locator(area).first().evaluate((root, min) => {
    const controls = root.querySelectorAll<HTMLElement>("a[href], button, select, textarea, summary, input:not([type=hidden])");
    const out: string[] = [];
    for (const el of controls) {
      const style = getComputedStyle(el);
      if (el.closest("[hidden], details:not([open]) > :not(summary)") || style.visibility === "hidden") continue;
      if (el.tagName === "A" && style.display === "inline") continue;
      const target = el instanceof HTMLInputElement && (el.type === "checkbox" || el.type === "radio") ? el.closest("label") ?? el : el;
      const box = target.getBoundingClientRect();
      if (box.width === 0 && box.height === 0) continue;
      if (box.width < min - 0.5 || box.height < min - 0.5) {
        const name = (target.textContent ?? "").trim().slice(0, 40) || el.getAttribute("aria-label") || el.getAttribute("name") || el.tagName;
        out.push(`${el.tagName.toLowerCase()} "${name}" ${Math.round(box.width)}×${Math.round(box.height)}`);
      }
    }
    return out;
  }, MIN_TARGET_PX);
}
