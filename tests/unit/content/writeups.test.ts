import { existsSync, readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { renderMarkdown } from "@/lib/markdown/render";
import { contentDir, content } from "./load";

const imagesDir = path.join(contentDir, "writeups", "images");
const words = (md: string) => md.split(/\s+/).filter((w) => /[\p{L}\p{N}]/u.test(w)).length;
const inlineImages = (md: string) => [...md.matchAll(/!\[[^\]]+\]\(images\/([^)\s]+)\)/g)].map((m) => m[1]);

describe("demo write-ups", () => {
  it("has at least 60, mostly published, with three or four drafts", () => {
    const { writeups } = content();
    expect(writeups.length).toBeGreaterThanOrEqual(60);
    const drafts = writeups.filter((w) => w.status === "draft").length;
    expect(drafts).toBeGreaterThanOrEqual(3);
    expect(drafts).toBeLessThanOrEqual(4);
    expect(new Set(writeups.map((w) => w.title)).size).toBe(writeups.length);
  });

  it("is written mostly by the senior mechanic, some by technicians", () => {
    const authors = content().writeups.map((w) => w.author);
    expect(new Set(authors)).toEqual(new Set(["senior", "tech"]));
    expect(authors.filter((a) => a === "senior").length).toBeGreaterThan(authors.length / 2);
  });

  it("keeps each body between 150 and 400 words, with headings, dated within 2025-01 to 2026-11", () => {
    for (const w of content().writeups) {
      expect(words(w.body), w.slug).toBeGreaterThanOrEqual(150);
      expect(words(w.body), w.slug).toBeLessThanOrEqual(400);
      expect(w.body, w.slug).toMatch(/^## /m);
      expect(w.date >= "2025-01-01" && w.date <= "2026-11-30", `${w.slug} ${w.date}`).toBe(true);
    }
  });

  it("renders every body to sanitised HTML with its section headings", () => {
    for (const w of content().writeups) {
      const { html, toc } = renderMarkdown(w.body);
      expect(toc.filter((t) => t.depth === 2).length, w.slug).toBeGreaterThanOrEqual(2);
      expect(html, w.slug).toMatch(/<h2 id="wu-/);
      expect(html, w.slug).not.toMatch(/<script|on\w+=/i);
    }
  });

  it("covers every cause and every motor family in at least one write-up", () => {
    const { writeups, causes, families } = content();
    const coveredCauses = new Set(writeups.flatMap((w) => w.causes));
    const coveredFamilies = new Set(writeups.flatMap((w) => w.families));
    expect(causes.map((c) => c.slug).filter((c) => !coveredCauses.has(c))).toEqual([]);
    expect(families.map((f) => f.slug).filter((f) => !coveredFamilies.has(f))).toEqual([]);
  });

  it("illustrates at least eight write-ups, and every image they name exists", () => {
    const { writeups } = content();
    expect(writeups.filter((w) => inlineImages(w.body).length > 0).length).toBeGreaterThanOrEqual(8);
    for (const w of writeups) {
      for (const file of [...w.photos, ...inlineImages(w.body)]) expect(existsSync(path.join(imagesDir, file)), `${w.slug}: ${file}`).toBe(true);
      for (const file of inlineImages(w.body)) expect(w.photos, `${w.slug} lists ${file} in photos`).toContain(file);
    }
  });

  it("ships at least eight self-drawn SVG diagrams with no external references or named fonts", () => {
    const svgs = readdirSync(imagesDir).filter((f) => f.endsWith(".svg"));
    expect(svgs.length).toBeGreaterThanOrEqual(8);
    for (const f of svgs) {
      const svg = readFileSync(path.join(imagesDir, f), "utf8");
      expect(svg, f).toMatch(/^<svg [^>]*xmlns="http:\/\/www\.w3\.org\/2000\/svg"/);
      expect(svg, f).toMatch(/<title>[^<]+<\/title>/);
      expect(svg, f).not.toMatch(/(?:xlink:)?href=|<image|<script|url\((?!#)/);
      for (const m of svg.matchAll(/font-family="([^"]*)"/g)) expect(m[1], f).toBe("sans-serif");
    }
  });

  it("gives the standing caution where a write-up covers opening a unit or a damaged battery", () => {
    for (const w of content().writeups.filter((x) => x.status === "published")) {
      if (/\b(opened|opening|inside)\b/i.test(w.body)) expect(w.body, w.slug).toMatch(/battery (was |is )?(out|comes out)|remove the battery|take the battery out|disconnect the battery/i);
      if (/\bwet battery|battery (got|was also) (wet|in)|submerged\b/i.test(w.body)) expect(w.body, w.slug).toMatch(/fire risk/i);
    }
  });
});
