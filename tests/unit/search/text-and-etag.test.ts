import { describe, expect, it } from "vitest";
import { etagMatches, indexEtag } from "@/lib/search/etag";
import { highlightSegments, snippetAround } from "@/lib/search/highlight";
import { markdownToPlainText } from "@/lib/search/plain-text";

describe("Markdown to plain text for the index", () => {
  it("keeps the words and drops the syntax", () => {
    const md = [
      "## Findings", "", "- **Two** sprags had _polished_ flats.", "1. New `clutch`.", "",
      "![Sprag drawing](/api/uploads/0123456789abcdef0123456789abcdef)", "",
      "See [the bench notes](https://shop.invalid/notes).", "",
      "| Item | Minutes |", "|---|---:|", "| Strip | 35 |", "", "> quoted", "", "```", "torque = 240", "```", "", "---", "<b>raw</b>",
    ].join("\n");
    expect(markdownToPlainText(md)).toBe(
      "Findings Two sprags had polished flats. New clutch. Sprag drawing See the bench notes. Item Minutes Strip 35 quoted torque = 240 raw",
    );
  });

  it("leaves snake_case and inner asterisks of words alone", () => {
    expect(markdownToPlainText("motor_clutch and 2*3")).toBe("motor_clutch and 2*3");
  });
});

describe("highlighting matched words", () => {
  it("marks whole words case-insensitively, longest first", () => {
    expect(highlightSegments("Sprags and a sprag cage", ["sprags", "sprag"])).toEqual([
      { text: "Sprags", hit: true }, { text: " and a ", hit: false }, { text: "sprag", hit: true }, { text: " cage", hit: false },
    ]);
  });

  it("does not mark a word inside another word, and handles regex characters", () => {
    expect(highlightSegments("bearings", ["bearing"])).toEqual([{ text: "bearings", hit: false }]);
    expect(highlightSegments("c++ (x)", ["c++"])[0]).toEqual({ text: "c++", hit: true });
  });

  it("cuts a snippet around the first match", () => {
    const text = `${"lead ".repeat(40)}the needle bearing was wet ${"tail ".repeat(40)}`;
    const snippet = snippetAround(text, ["needle"], 30)!;
    expect(snippet.startsWith("… ")).toBe(true);
    expect(snippet.endsWith(" …")).toBe(true);
    expect(snippet).toContain("the needle bearing");
    expect(snippetAround(text, ["absent"])).toBeNull();
  });
});

describe("the index ETag", () => {
  it("changes with the count, the latest change and the catalogue names", () => {
    const at = new Date("2025-08-14T10:00:00.000Z");
    const catalogue = "0123456789abcdef0123456789abcdef";
    const base = indexEtag({ count: 3, maxUpdatedAt: at, catalogue });
    expect(indexEtag({ count: 4, maxUpdatedAt: at, catalogue })).not.toBe(base);
    expect(indexEtag({ count: 3, maxUpdatedAt: new Date(at.getTime() + 1), catalogue })).not.toBe(base);
    expect(indexEtag({ count: 3, maxUpdatedAt: at, catalogue: "f" + catalogue.slice(1) })).not.toBe(base);
    expect(indexEtag({ count: 3, maxUpdatedAt: new Date(at), catalogue })).toBe(base);
  });

  it("matches If-None-Match lists, weak tags and the wildcard", () => {
    const tag = indexEtag({ count: 1, maxUpdatedAt: null, catalogue: "" });
    expect(etagMatches(tag, tag)).toBe(true);
    expect(etagMatches(`"other", W/${tag}`, tag)).toBe(true);
    expect(etagMatches("*", tag)).toBe(true);
    expect(etagMatches(`"other"`, tag)).toBe(false);
    expect(etagMatches(null, tag)).toBe(false);
  });
});
