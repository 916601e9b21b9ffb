import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CautionNotes } from "@/components/triage/caution-notes";
import type { ViewNode } from "@/lib/triage/walk-view";

const caution = (key: string, title: string, cautionText: string): ViewNode => ({
  id: 1, key, kind: "caution", title, prompt: "", costMinutes: 0, needsOpening: false, causeSlug: null, cautionText,
});

describe("CautionNotes", () => {
  const html = renderToStaticMarkup(createElement(CautionNotes, {
    cautions: [caution("c-ride", "Stop riding", "The drive may jam."), caution("c-battery", "Battery", "Take the battery off first.")],
  }));

  it("lists each passed caution as a note inside a list item (a list may hold only items)", () => {
    expect(html.match(/<li>/g)).toHaveLength(2);
    expect(html.match(/<li><div role="note"/g)).toHaveLength(2);
    expect(html).not.toMatch(/<li[^>]*role=/);
    expect(html).toContain("Take the battery off first.");
  });

  it("draws nothing when no caution has been passed", () => {
    expect(renderToStaticMarkup(createElement(CautionNotes, { cautions: [] }))).toBe("");
  });
});
