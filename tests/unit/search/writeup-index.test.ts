import { describe, expect, it } from "vitest";
import { fuzzyDistance, indexedTerm, matchesAsPrefix, serializeIndex, WriteupIndex } from "@/lib/search/writeup-index";
import { comparable } from "../../support/search";
import { doc, DOCS } from "./docs";

const ids = (hits: { doc: { id: number } }[]) => hits.map((h) => h.doc.id);

describe("write-up search", () => {
  const index = new WriteupIndex(DOCS);

  it("matches a prefix: “sprag” finds the write-up titled with “sprags”", () => {
    const hits = index.search("sprag");
    expect(ids(hits)).toContain(1);
    expect(hits.find((h) => h.doc.id === 1)!.terms).toContain("sprags");
  });

  it("forgives a typo: “bearnig” finds the bearing write-ups", () => {
    const hits = index.search("bearnig");
    expect(ids(hits)).toEqual(expect.arrayContaining([2, 5]));
    expect(hits[0].terms).toContain("bearing");
  });

  it("matches every word typed so far, the last one as a prefix", () => {
    expect(ids(index.search("needle bea"))).toEqual([2]);
    expect(ids(index.search("crank bear"))).toEqual(expect.arrayContaining([5, 2]));
    expect(index.search("crank bear")[0].doc.id).toBe(5);
  });

  it("a word of one or two letters matches only itself, not every word it begins", () => {
    // DOCS have "bearing" and "belt" but no word "b" or "be": from three letters the prefix counts.
    expect(index.search("b")).toEqual([]);
    expect(index.search("be")).toEqual([]);
    expect(ids(index.search("bea"))).toEqual(expect.arrayContaining([2, 5]));
    const short = new WriteupIndex([doc(20, { title: "O ring seated", text: "" }), doc(21, { title: "Oil on the rotor", text: "" })]);
    expect(ids(short.search("o"))).toEqual([20]);
    expect(ids(short.search("oi"))).toEqual([]);
    expect(ids(short.search("oil"))).toEqual([21]);
    expect([matchesAsPrefix("be"), matchesAsPrefix("bea")]).toEqual([false, true]);
  });

  it("leaves common English words out of the index and of queries", () => {
    const common = new WriteupIndex([doc(30, { title: "Water in the motor", text: "" }), doc(31, { title: "Tools to use", text: "" })]);
    expect(common.search("the")).toEqual([]);
    expect(common.search("to")).toEqual([]);
    expect(ids(common.search("water the motor"))).toEqual([30]);
    expect(ids(common.search("too"))).toEqual([31]);
    expect([indexedTerm("The"), indexedTerm("Torque")]).toEqual([null, "torque"]);
  });

  it("ranks a title match above a body match", () => {
    // Write-up 3 says "sprag" three times in its body; write-up 1 has it once, in the title (and cause).
    const hits = index.search("sprag");
    expect(ids(hits).slice(0, 2)).toEqual([1, 3]);
    expect(hits[0].score).toBeGreaterThan(hits[1].score);
    const titleOnly = new WriteupIndex([
      doc(10, { title: "Spoke noise", text: "" }),
      doc(11, { title: "Something else", text: "a note about spoke tension and a spoke" }),
    ]);
    expect(ids(titleOnly.search("spoke"))).toEqual([10, 11]);
  });

  it("ranks a cause or part match above a body match", () => {
    const boosted = new WriteupIndex([
      doc(20, { title: "Rattle", text: "the tensioner was checked and the tensioner looked fine" }),
      doc(21, { title: "Rattle", parts: ["Belt tensioner"] }),
      doc(22, { title: "Rattle", causes: ["Tensioner spring broken"] }),
    ]);
    const order = ids(boosted.search("tensioner"));
    expect(order[2]).toBe(20);
  });

  it("filters by motor family, by cause and by tag, with and without words", () => {
    expect(ids(index.search("", { family: "quillon-skarn-1" })).sort()).toEqual([1, 3]);
    expect(ids(index.search("sprag", { family: "quillon-skarn-1", cause: "gear-tooth-broken" }))).toEqual([3]);
    expect(ids(index.search("", { tag: "bearing" })).sort()).toEqual([2, 5]);
    expect(ids(index.search("bearing", { tag: "water" }))).toEqual([2]);
    expect(index.search("belt", { family: "quillon-skarn-1" })).toEqual([]);
  });

  it("lists everything, newest first, for an empty query", () => {
    const all = index.search("   ");
    expect(all).toHaveLength(DOCS.length);
    const dates = all.map((h) => h.doc.publishedAt ?? "");
    expect([...dates].sort().reverse()).toEqual(dates);
  });

  it("falls back to any word when no write-up has them all", () => {
    // 3 comes in too: its body says "sprag", one edit from "sprags".
    expect(ids(index.search("belt sprags")).sort()).toEqual([1, 3, 4]);
  });

  it("offers filter choices with counts, by label", () => {
    const { families, tags } = index.facets();
    expect(families.find((f) => f.value === "quillon-skarn-1")).toEqual({ value: "quillon-skarn-1", label: "Skarn Gen 1", count: 2 });
    expect(tags.find((t) => t.value === "trail")?.count).toBe(2);
    expect(families.map((f) => f.label)).toEqual([...families.map((f) => f.label)].sort((a, b) => a.localeCompare(b)));
  });

  it("allows a fifth of a word's length in edits, rounded up, at most two, none for short words", () => {
    expect([fuzzyDistance("gear"), fuzzyDistance("crank"), fuzzyDistance("bearnig"), fuzzyDistance("waterproofing"), fuzzyDistance("owc")])
      .toEqual([1, 1, 2, 2, 0]);
  });

  it("loads from the serialised index (as sent over JSON) and answers exactly as when built here", async () => {
    const shipped = new WriteupIndex(DOCS, JSON.parse(JSON.stringify(await serializeIndex(DOCS))));
    for (const q of ["sprag", "bearnig", "needle bea", "crank bear", "water", "zzzz"]) {
      expect(comparable(shipped.search(q))).toEqual(comparable(index.search(q)));
      expect(comparable(shipped.search(q, { family: DOCS[0].familySlugs[0] }))).toEqual(comparable(index.search(q, { family: DOCS[0].familySlugs[0] })));
    }
  });
});
