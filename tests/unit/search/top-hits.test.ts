import MiniSearch from "minisearch";
import { describe, expect, it } from "vitest";
import { TopHits } from "@/lib/search/top-hits";
import type { SearchDoc } from "@/lib/search/types";
import { FIELD_BOOSTS, fuzzyDistance, MINI_OPTIONS, serializeIndex, WriteupIndex } from "@/lib/search/writeup-index";
import { prng } from "@/lib/random";
import { doc } from "./docs";

const FIELDS = MINI_OPTIONS.fields;

// Invented shop words, recombined at random so that prefixes, near misses and ties all occur.
const WORDS = ["bearing", "bearings", "bear", "beard", "sprag", "sprags", "spragged", "seal", "seals", "sealed", "clutch", "clutches",
  "crank", "cranks", "cranky", "water", "washer", "wash", "grease", "greased", "torque", "sensor", "sensors", "belt", "belts",
  "pulley", "gear", "gears", "geared", "cage", "caged", "shaft", "crack", "cracked", "noise", "whine", "grind", "grinding"];

function corpus(size: number): SearchDoc[] {
  const random = prng(4242);
  const words = (n: number) => Array.from({ length: n }, () => WORDS[Math.floor(random() * WORDS.length)]).join(" ");
  return Array.from({ length: size }, (_, i) => doc(i + 1, {
    title: words(1 + Math.floor(random() * 4)), summary: words(Math.floor(random() * 8)), text: words(Math.floor(random() * 40)),
    causes: random() < 0.7 ? [words(2)] : [], parts: random() < 0.5 ? [words(2)] : [], tags: [words(1)],
  }));
}

const QUERIES = ["bea", "bear", "bearing", "bearnig", "spr", "sprag", "seal wat", "crank bearing", "seal seal", "grinding noise",
  "cluthc", "gear cage shaft", "whine", "zzz", "torque zzz", "Sensor, belt!", "", "   "];

// MiniSearch's own answer, cut to a page, in the shape TopHits returns.
function reference(mini: MiniSearch<SearchDoc>, query: string, combineWith: "AND" | "OR", fuzzy: typeof fuzzyDistance | false, limit: number, filter?: (id: number) => boolean) {
  const results = mini.search(query, { combineWith, fuzzy, filter: filter ? (r) => filter(r.id) : undefined });
  return {
    total: results.length,
    hits: results.slice(0, limit).map((r) => ({ id: r.id, score: r.score, terms: r.terms, fields: [...new Set(Object.values(r.match).flat())] })),
  };
}

async function indexOf(docs: SearchDoc[]) {
  const mini = MiniSearch.loadJS<SearchDoc>(await serializeIndex(docs), MINI_OPTIONS);
  return { mini, top: TopHits.attach(mini, FIELDS, FIELD_BOOSTS)! };
}

describe("TopHits: MiniSearch's ranking, keeping only a page", () => {
  it("gives MiniSearch's totals, order, scores and matched words for prefix, fuzzy, AND and OR queries", async () => {
    const { mini, top } = await indexOf(corpus(600));
    expect(top).not.toBeNull();
    expect(top.usable).toBe(true);
    let compared = 0;
    for (const query of QUERIES) {
      for (const combineWith of ["AND", "OR"] as const) {
        for (const fuzzy of [false, fuzzyDistance] as const) {
          const want = reference(mini, query, combineWith, fuzzy, Infinity);
          const got = top.search(query, { combineWith, fuzzy, prefix: true, limit: 20 });
          const label = `“${query}” ${combineWith}${fuzzy ? " fuzzy" : ""}`;
          expect(got.total, label).toBe(want.total);
          expect(got.hits.map((h) => h.score), label).toEqual(want.hits.slice(0, 20).map((h) => expect.closeTo(h.score, 9)));
          // Documents with equal scores may come in another order; each one shown must be MiniSearch's, word for word.
          const wanted = new Map(want.hits.map((h) => [h.id, h]));
          for (const hit of got.hits) expect(hit, label).toEqual({ ...wanted.get(hit.id), score: expect.closeTo(hit.score, 9) });
          compared += want.total;
        }
      }
    }
    expect(compared).toBeGreaterThan(1000);
  });

  it("applies the filter before counting and cutting", async () => {
    const { mini, top } = await indexOf(corpus(300));
    const even = (id: number) => id % 2 === 0;
    const want = reference(mini, "gear", "AND", false, 10, even);
    const got = top.search("gear", { combineWith: "AND", fuzzy: false, prefix: true, filter: even, limit: 10 });
    expect(got.total).toBe(want.total);
    expect(got.total).toBeGreaterThan(10);
    expect(got.hits.every((h) => h.id % 2 === 0)).toBe(true);
    expect(got.hits.map((h) => h.score)).toEqual(want.hits.map((h) => expect.closeTo(h.score, 9)));
  });

  it("leaves nothing behind from one query to the next", async () => {
    const { top } = await indexOf(corpus(200));
    const first = top.search("seal", { combineWith: "AND", fuzzy: false, prefix: true, limit: 50 });
    top.search("bearing crank", { combineWith: "OR", fuzzy: fuzzyDistance, prefix: true, limit: 50 });
    expect(top.search("seal", { combineWith: "AND", fuzzy: false, prefix: true, limit: 50 })).toEqual(first);
  });

  it("steps aside once documents were discarded, or when MiniSearch's index is not as expected", async () => {
    const docs = corpus(100);
    const { mini, top } = await indexOf(docs);
    mini.discard(docs[0].id);
    expect(top.usable).toBe(false);
    expect(TopHits.attach({} as MiniSearch<SearchDoc>, FIELDS, FIELD_BOOSTS)).toBeNull();
  });

  it("is what WriteupIndex searches with: the same hits as MiniSearch's own search on a large corpus", async () => {
    const docs = corpus(1500);
    const index = new WriteupIndex(docs, await serializeIndex(docs));
    const { mini } = await indexOf(docs);
    for (const query of ["bea", "seal wat", "cluthc", "torque zzz"]) {
      const hits = index.search(query, {}, 10);
      expect(hits.length, query).toBeGreaterThan(0);
      const mode = { combineWith: "AND" as const, fuzzy: false as const };
      let want = reference(mini, query, mode.combineWith, mode.fuzzy, Infinity);
      if (want.total < 10) want = reference(mini, query, "AND", fuzzyDistance, Infinity);
      if (want.total === 0) want = reference(mini, query, "OR", fuzzyDistance, Infinity);
      expect(hits.map((h) => h.score), query).toEqual(want.hits.slice(0, 10).map((h) => expect.closeTo(h.score, 9)));
    }
  });
});
