import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { renderMarkdown, wantsToc } from "@/lib/markdown/render";

const ROOT = path.resolve(__dirname, "../../..");

describe("one pipeline for the article page and the editor preview", () => {
  it("uses no server-only module, so the browser runs the very same function", () => {
    const files = ["lib/markdown/render.ts", "lib/markdown/plugins.ts", "lib/markdown/schema.ts", "lib/storage/urls.ts"];
    for (const file of files) {
      const text = readFileSync(path.join(ROOT, file), "utf8");
      expect(text, file).not.toMatch(/from "(node:|fs|path|server-only|@\/db)/);
    }
    // The editor imports it directly rather than a copy.
    expect(readFileSync(path.join(ROOT, "components/writeups/writeup-editor.tsx"), "utf8")).toContain('from "@/lib/markdown/render"');
    expect(readFileSync(path.join(ROOT, "components/writeups/writeup-article.tsx"), "utf8")).toContain('from "@/lib/markdown/render"');
  });

  it("renders the same Markdown to the same HTML every time (no per-call state leaks between renders)", () => {
    const a = "## Repair\n\n## Repair\n\ntext";
    const first = renderMarkdown(a);
    renderMarkdown("## Other\n\n## Repair");
    expect(renderMarkdown(a)).toEqual(first);
    // Repeated headings get distinct anchors within one document, and start over in the next.
    expect(first.toc.map((t) => t.id)).toEqual(["wu-repair", "wu-repair-1"]);
  });

  it("every demo write-up renders without leaving a drawing or raw HTML in its output", () => {
    const dir = path.join(ROOT, "content/writeups");
    for (const file of readdirSync(dir).filter((f) => f.endsWith(".md"))) {
      const { html } = renderMarkdown(readFileSync(path.join(dir, file), "utf8").split(/^---$/m).slice(2).join("---"));
      expect(html, file).not.toMatch(/\.svg|<img/);
      expect(html.length, file).toBeGreaterThan(200);
    }
  });

  it("offers a table of contents only to long write-ups", () => {
    expect(wantsToc(renderMarkdown("## A\n\n## B\n\n## C"))).toBe(false);
    expect(wantsToc(renderMarkdown("## A\n\n## B\n\n### B1\n\n## C"))).toBe(true);
  });
});
