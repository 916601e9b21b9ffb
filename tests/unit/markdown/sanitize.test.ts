import type { Root } from "hast";
import rehypeSanitize from "rehype-sanitize";
import { describe, expect, it } from "vitest";
import { renderMarkdown } from "@/lib/markdown/render";
import { writeupSchema } from "@/lib/markdown/schema";
import { unsafeParts } from "./safe-html";
import { ALL_VECTORS, HTML5SEC, MARKDOWN, OWASP, PORTSWIGGER } from "./xss-vectors";

// Each payload is tried where an author could put it: alone, inside a sentence, in a list item,
// in a table cell, in a quote and as the target of a link and an image.
const PLACES: [string, (v: string) => string][] = [
  ["alone", (v) => v],
  ["in a sentence", (v) => `The rider said ${v} and left.`],
  ["in a list", (v) => `- first\n- ${v}\n- last`],
  ["in a table", (v) => `| a | b |\n|---|---|\n| ${v.replace(/\|/g, "\\|").replace(/\n/g, " ")} | x |`],
  ["in a quote", (v) => `> ${v.replace(/\n/g, " ")}`],
  ["as a link target", (v) => `[open](${v.replace(/[()\s]/g, "")})`],
  ["as an image source", (v) => `![photo](${v.replace(/[()\s]/g, "")})`],
];

describe("the Markdown sanitiser against a corpus of known XSS vectors", () => {
  it("holds at least 50 vectors from the named public lists", () => {
    expect(OWASP.length + PORTSWIGGER.length + HTML5SEC.length + MARKDOWN.length).toBe(ALL_VECTORS.length);
    expect(ALL_VECTORS.length).toBeGreaterThanOrEqual(50);
  });

  for (const [where, place] of PLACES) {
    it(`strips every vector ${where}`, () => {
      const failures = ALL_VECTORS.flatMap((vector) => {
        const problems = unsafeParts(renderMarkdown(place(vector)).html);
        return problems.length ? [`${vector} → ${problems.join(", ")}`] : [];
      });
      expect(failures).toEqual([]);
    });
  }

  it("the checker itself catches unsafe output (it is not vacuous)", () => {
    expect(unsafeParts(`<img src="x" onerror="alert(1)">`)).toEqual(expect.arrayContaining(["attribute onerror on <img>", "src x"]));
    expect(unsafeParts(`<a href="javascript:alert(1)">x</a>`)).toContain("href javascript:alert(1)");
    expect(unsafeParts(`<script>alert(1)</script>`)).toContain("tag <script>");
    expect(unsafeParts(`<p style="color:red">x</p>`)).toContain("attribute style on <p>");
  });

  it("the schema alone refuses dangerous elements and attributes in a tree that did not come from Markdown", () => {
    // Raw HTML never reaches the tree from Markdown, so this feeds the sanitiser such a tree directly.
    const tree: Root = {
      type: "root",
      children: [
        { type: "element", tagName: "script", properties: {}, children: [{ type: "text", value: "alert(1)" }] },
        { type: "element", tagName: "iframe", properties: { src: "javascript:alert(1)" }, children: [] },
        { type: "element", tagName: "p", properties: { onClick: "alert(1)", style: "x" }, children: [{ type: "text", value: "kept" }] },
        { type: "element", tagName: "a", properties: { href: "javascript:alert(1)" }, children: [{ type: "text", value: "link" }] },
        { type: "element", tagName: "a", properties: { href: "data:text/html,x" }, children: [{ type: "text", value: "data" }] },
        { type: "element", tagName: "img", properties: { src: "https://evil.invalid/x.png", onError: "alert(1)" }, children: [] },
        { type: "element", tagName: "img", properties: { src: "/api/uploads/0123456789abcdef0123456789abcdef", alt: "ok" }, children: [] },
        { type: "element", tagName: "svg", properties: { onLoad: "alert(1)" }, children: [] },
        { type: "element", tagName: "div", properties: { className: ["x"] }, children: [{ type: "text", value: "unwrapped" }] },
      ],
    };
    const clean = rehypeSanitize(writeupSchema)(tree);
    const tags = JSON.stringify(clean);
    expect(tags).not.toMatch(/"tagName":"(script|iframe|svg|div)"/);
    expect(tags).not.toMatch(/onClick|onError|onLoad|style|javascript:|data:text/);
    expect(tags).toContain('"src":"/api/uploads/0123456789abcdef0123456789abcdef"');
    expect(tags).not.toContain("evil.invalid");
    expect(tags).toContain("kept");
    expect(tags).toContain("unwrapped");
  });
});

describe("what write-ups need survives the sanitiser", () => {
  const source = [
    "## Findings",
    "",
    "### The clutch",
    "",
    "- rollers polished",
    "- cage cracked",
    "",
    "1. strip",
    "2. replace",
    "",
    "- [x] new seal fitted",
    "",
    "| Item | Minutes |",
    "|:---|---:|",
    "| Strip | 35 |",
    "",
    "```ts",
    "const torqueNm = 240; // <script> stays text",
    "```",
    "",
    "Inline `code`, **bold**, _emphasis_, ~~struck~~ and a [web link](https://shop.invalid/parts) and a [mail](mailto:bench@example.test).",
    "",
    "> quoted from the bench notes",
    "",
    "![bearing](/api/uploads/0123456789abcdef0123456789abcdef)",
    "",
    "![thumb](/api/uploads/0123456789abcdef0123456789abcdef/thumb)",
    "",
    "---",
  ].join("\n");
  const { html, toc } = renderMarkdown(source);

  it("keeps headings, with anchors, and lists them for the table of contents", () => {
    expect(html).toContain('<h2 id="wu-findings">Findings<a href="#wu-findings" class="heading-anchor" aria-label="Link to this section">#</a></h2>');
    expect(html).toContain('<h3 id="wu-the-clutch">');
    expect(toc).toEqual([{ depth: 2, id: "wu-findings", text: "Findings" }, { depth: 3, id: "wu-the-clutch", text: "The clutch" }]);
  });

  it("keeps lists, task boxes, tables with alignment, code, emphasis, links, quotes and rules", () => {
    expect(html).toContain("<ul>\n<li>rollers polished</li>");
    expect(html).toContain("<ol>\n<li>strip</li>");
    expect(html).toContain('<input type="checkbox" checked disabled>');
    expect(html).toContain('<th align="left">Item</th>');
    expect(html).toContain('<td align="right">35</td>');
    expect(html).toContain('<pre><code class="language-ts">const torqueNm = 240; // &#x3C;script> stays text');
    expect(html).toContain("<code>code</code>");
    expect(html).toContain("<strong>bold</strong>");
    expect(html).toContain("<em>emphasis</em>");
    expect(html).toContain("<del>struck</del>");
    expect(html).toContain('<a href="https://shop.invalid/parts" rel="nofollow noopener noreferrer">web link</a>');
    expect(html).toContain('<a href="mailto:bench@example.test" rel="nofollow noopener noreferrer">mail</a>');
    expect(html).toContain("<blockquote>");
    expect(html).toContain("<hr>");
  });

  it("keeps images from our upload route, full size and thumbnail", () => {
    expect(html).toContain('<img src="/api/uploads/0123456789abcdef0123456789abcdef" alt="bearing" loading="lazy" decoding="async">');
    expect(html).toContain('<img src="/api/uploads/0123456789abcdef0123456789abcdef/thumb" alt="thumb"');
    expect(unsafeParts(html)).toEqual([]);
  });

  it("drops other images entirely and leaves no empty paragraph behind", () => {
    const out = renderMarkdown("before\n\n![x](https://evil.invalid/x.png)\n\n![y](images/drawing.svg)\n\nafter").html;
    expect(out).toBe("<p>before</p>\n\n\n<p>after</p>");
  });

  it("turns a refused link into its text", () => {
    expect(renderMarkdown("[press here](javascript:alert(1))").html).toBe("<p>press here</p>");
  });
});
