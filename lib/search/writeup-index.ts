import MiniSearch, { type Options } from "minisearch";
import type { SearchDoc, SearchFilters, SerializedIndex } from "./types";

/** The seven searchable parts of a write-up go into four indexed fields, one per weight. */
const FIELDS = ["title", "facets", "summary", "body"] as const;
type Field = (typeof FIELDS)[number];

/** Title first, then what failed and what was fitted (causes, parts), then the summary; the body weighs least. */
export const FIELD_BOOSTS: Record<Field, number> = { title: 5, facets: 3, summary: 1.5, body: 1 };

function fieldText(doc: SearchDoc, field: string): string | number {
  switch (field) {
    case "id": return doc.id;
    case "title": return doc.title;
    case "facets": return [...doc.causes, ...doc.parts].join(" ");
    case "summary": return doc.summary;
    case "body": return [doc.text, ...doc.families, ...doc.tags].join(" ");
    default: return "";
  }
}

/**
 * Edit distance allowed per query word: a fifth of its length, rounded up, at most 2, none under
 * four letters. Rounding up lets one swapped pair of letters ("bearnig", two edits) still match a
 * seven-letter word, which rounding to nearest would not.
 */
export function fuzzyDistance(term: string): number {
  return term.length < 4 ? 0 : Math.min(2, Math.ceil(term.length * 0.2));
}

/**
 * A query word this long or longer also matches the words it begins; a shorter one matches only
 * itself. One or two letters begin thousands of the indexed words, and looking them all up took
 * hundreds of milliseconds a keystroke at 10,000 write-ups, for results no one reads.
 */
export const MIN_PREFIX = 3;

export function matchesAsPrefix(term: string): boolean {
  return term.length >= MIN_PREFIX;
}

/**
 * English words too common to tell one write-up from another: left out of the index and of
 * queries. Typed on their way to a longer word ("to" in "torque"), each matched nearly every
 * write-up. "s" and "t" are what is left of "maker's" and "don't" once the apostrophe splits them.
 */
const STOP_WORDS = new Set([
  "a", "an", "and", "are", "as", "at", "be", "but", "by", "for", "from", "had", "has", "have", "if", "in", "into", "is", "it",
  "its", "no", "not", "of", "on", "or", "s", "so", "t", "than", "that", "the", "then", "there", "this", "to", "was", "were",
  "when", "with",
]);

/** A word as indexed and searched: lower case, or nothing for a stop word. */
export function indexedTerm(term: string): string | null {
  const lower = term.toLowerCase();
  return STOP_WORDS.has(lower) ? null : lower;
}

/** Fewer exact-or-prefix results than this, and the search tries near misses too. */
export const FUZZY_BELOW = 10;

export interface WriteupHit {
  doc: SearchDoc;
  score: number;
  /** The indexed words that matched, for highlighting. */
  terms: string[];
  /** Fields in which they matched. */
  fields: string[];
}

export interface Facet {
  value: string;
  label: string;
  count: number;
}

function matchesFilters(doc: SearchDoc, filters: SearchFilters): boolean {
  return (!filters.family || doc.familySlugs.includes(filters.family))
    && (!filters.cause || doc.causeSlugs.includes(filters.cause))
    && (!filters.tag || doc.tags.includes(filters.tag));
}

function facet(pairs: [string, string][]): Facet[] {
  const byValue = new Map<string, Facet>();
  for (const [value, label] of pairs) {
    const entry = byValue.get(value) ?? { value, label, count: 0 };
    entry.count++;
    byValue.set(value, entry);
  }
  return [...byValue.values()].sort((a, b) => a.label.localeCompare(b.label));
}

/** How write-ups are indexed: the server builds with these, the page loads with the same. */
export const MINI_OPTIONS: Options<SearchDoc> & { fields: string[] } = {
  fields: [...FIELDS],
  storeFields: [],
  extractField: fieldText,
  processTerm: indexedTerm,
  searchOptions: { boost: FIELD_BOOSTS, prefix: matchesAsPrefix, fuzzy: fuzzyDistance },
};

/**
 * The index of `docs`, built once on the server and sent with them, so a browser loads it instead of
 * building it. Built in chunks that yield to the event loop: at 10,000 write-ups the build takes
 * seconds, and the one server process must keep answering triage calls meanwhile.
 */
export async function serializeIndex(docs: readonly SearchDoc[]): Promise<SerializedIndex> {
  const mini = new MiniSearch<SearchDoc>(MINI_OPTIONS);
  await mini.addAllAsync(docs, { chunkSize: 250 });
  return mini.toJSON();
}

/** The client-side search over published write-ups: the same code runs in the page and in the tests. */
export class WriteupIndex {
  private readonly mini: MiniSearch<SearchDoc>;
  private readonly byId: Map<number, SearchDoc>;
  readonly docs: readonly SearchDoc[];

  /** From the documents alone (tokenised here), or with the index serializeIndex made of exactly these documents. */
  constructor(docs: readonly SearchDoc[], serialized?: SerializedIndex) {
    this.docs = docs;
    this.byId = new Map(docs.map((d) => [d.id, d]));
    if (serialized) {
      this.mini = MiniSearch.loadJS<SearchDoc>(serialized, MINI_OPTIONS);
    } else {
      this.mini = new MiniSearch<SearchDoc>(MINI_OPTIONS);
      this.mini.addAll(docs);
    }
  }

  get size(): number {
    return this.docs.length;
  }

  /**
   * Results as you type. Every word must match (itself, a word it begins from MIN_PREFIX letters
   * on, or a near miss); when that finds nothing, any word may. An empty query lists the filtered
   * write-ups, newest first.
   */
  search(query: string, filters: SearchFilters = {}, limit = 50): WriteupHit[] {
    if (!query.trim()) {
      return this.docs
        .filter((doc) => matchesFilters(doc, filters))
        .sort((a, b) => (b.publishedAt ?? "").localeCompare(a.publishedAt ?? ""))
        .slice(0, limit)
        .map((doc) => ({ doc, score: 0, terms: [], fields: [] }));
    }
    // Cheapest first: exact and prefix matches of every word; near misses (fuzzy) only when those
    // find less than a page, which is when a typo is the likely reason; any word only as a last resort.
    const keep = this.keepFor(filters);
    let found = this.query(query, "AND", false, keep, limit);
    if (found.total < FUZZY_BELOW) found = this.query(query, "AND", fuzzyDistance, keep, limit);
    if (found.total === 0) found = this.query(query, "OR", fuzzyDistance, keep, limit);
    return found.hits.map((hit) => ({ doc: this.byId.get(hit.id)!, score: hit.score, terms: hit.terms, fields: hit.fields }));
  }

  private keepFor(filters: SearchFilters): ((id: number) => boolean) | undefined {
    // No filter chosen: no per-result callback (it costs when a common word matches thousands).
    if (!filters.family && !filters.cause && !filters.tag) return undefined;
    return (id: number) => {
      const doc = this.byId.get(id);
      return !!doc && matchesFilters(doc, filters);
    };
  }

  /** The best `limit` matches and how many there are, from MiniSearch's own search. */
  private query(query: string, combineWith: "AND" | "OR", fuzzy: typeof fuzzyDistance | false, keep: ((id: number) => boolean) | undefined, limit: number) {
    const results = this.mini.search(query, { combineWith, fuzzy, filter: keep ? (r) => keep(r.id) : undefined });
    return {
      total: results.length,
      hits: results.slice(0, limit).map((r) => ({ id: r.id as number, score: r.score, terms: r.terms, fields: [...new Set(Object.values(r.match).flat())] })),
    };
  }

  /** How many write-ups there are for each motor family, cause and tag: the filter choices. */
  facets(): { families: Facet[]; causes: Facet[]; tags: Facet[] } {
    return {
      families: facet(this.docs.flatMap((d) => d.familySlugs.map((s, i): [string, string] => [s, d.families[i] ?? s]))),
      causes: facet(this.docs.flatMap((d) => d.causeSlugs.map((s, i): [string, string] => [s, d.causes[i] ?? s]))),
      tags: facet(this.docs.flatMap((d) => d.tags.map((t): [string, string] => [t, t]))),
    };
  }
}
