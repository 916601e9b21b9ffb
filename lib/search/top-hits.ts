import MiniSearch from "minisearch";

/**
 * MiniSearch's own query, scored the same way (BM25+, prefix and fuzzy weights, field boosts,
 * AND/OR), but keeping only the best `limit` results. MiniSearch builds a result object, a terms
 * array and a match object for every matching document and then sorts them all; a three-letter
 * prefix typed into the search box matches thousands of write-ups, of which a page is shown. Here
 * the scores add up in typed arrays indexed by MiniSearch's internal document number, the matched
 * words are chained in flat arrays, and objects are made for the page only.
 *
 * It reads MiniSearch's index through the fields below (minisearch 7.x). `TopHits.attach` returns
 * null when they are not there, or when documents were discarded (their postings linger until
 * vacuumed), and the caller falls back to MiniSearch's own search; tests/unit/search/top-hits.test.ts
 * checks that both give the same results.
 */
type Postings = Map<number, Map<number, number>>;
interface TermMap {
  get(term: string): Postings | undefined;
  atPrefix(prefix: string): Iterable<[string, Postings]>;
  fuzzyGet(term: string, maxDistance: number): Map<string, [Postings, number]>;
}
interface MiniInternals {
  _index: TermMap;
  _fieldIds: Record<string, number>;
  _fieldLength: Map<number, number[]>;
  _avgFieldLength: number[];
  _documentIds: Map<number, number>;
  _documentCount: number;
  _nextId: number;
  _dirtCount: number;
}

// MiniSearch's defaults (minisearch 7.x, defaultSearchOptions and defaultBM25params).
const BM25 = { k: 1.2, b: 0.7, d: 0.5 };
const PREFIX_WEIGHT = 0.375;
const FUZZY_WEIGHT = 0.45;

export interface TopHit {
  /** The document's own id. */
  id: number;
  score: number;
  /** Indexed words that matched, in the order they were met. */
  terms: string[];
  /** Fields in which they matched. */
  fields: string[];
}

export interface TopHitsQuery {
  combineWith: "AND" | "OR";
  /** Near misses too, with this edit distance per query word (0: none). */
  fuzzy: ((term: string) => number) | false;
  prefix: boolean;
  /** Keep a document (by its own id)? */
  filter?: (id: number) => boolean;
  limit: number;
}

interface Expansion {
  term: string;
  weight: number;
  postings: Postings;
}

export class TopHits {
  private readonly fieldNames: string[];
  private readonly fieldIds: number[];
  private readonly boosts: number[];
  /** Per field and internal document number: BM25's length normalisation, k·(1 − b + b·length/average). */
  private readonly norms: Float64Array[];
  private readonly ids: Float64Array;
  private readonly tokenize = MiniSearch.getDefault("tokenize") as (text: string) => string[];
  private readonly processTerm = MiniSearch.getDefault("processTerm") as (term: string) => string | null | undefined | false;

  // Scratch space, reused by every query and reset for the documents it touched.
  private readonly score: Float64Array;
  private readonly specStamp: Int32Array;
  private readonly specCount: Int32Array;
  private readonly distinctCount: Int32Array;
  private readonly head: Int32Array;
  private readonly touched: Int32Array;
  private touchedCount = 0;
  private chainTerm = new Int32Array(1 << 14);
  private chainField = new Int32Array(1 << 14);
  private chainNext = new Int32Array(1 << 14);
  private chainCount = 0;

  private constructor(private readonly mini: MiniInternals, fields: readonly string[], boosts: Record<string, number>) {
    this.fieldNames = [...fields];
    this.fieldIds = fields.map((f) => mini._fieldIds[f]);
    this.boosts = fields.map((f) => boosts[f] || 1);
    const size = mini._nextId;
    this.norms = this.fieldIds.map((fieldId) => {
      const norm = new Float64Array(size);
      const average = mini._avgFieldLength[fieldId];
      for (const [doc, lengths] of mini._fieldLength) {
        norm[doc] = BM25.k * (1 - BM25.b + (BM25.b * (lengths[fieldId] ?? 0)) / average);
      }
      return norm;
    });
    this.ids = new Float64Array(size);
    for (const [doc, id] of mini._documentIds) this.ids[doc] = id;
    this.score = new Float64Array(size);
    this.specStamp = new Int32Array(size);
    this.specCount = new Int32Array(size);
    this.distinctCount = new Int32Array(size);
    this.head = new Int32Array(size).fill(-1);
    this.touched = new Int32Array(size);
  }

  /** A scorer over `mini`'s index, or null when this MiniSearch does not look as expected. */
  static attach(mini: MiniSearch<never> | MiniSearch<unknown>, fields: readonly string[], boosts: Record<string, number>): TopHits | null {
    const inner = mini as unknown as Partial<MiniInternals>;
    const looksRight = inner._index && typeof inner._index.atPrefix === "function" && typeof inner._index.fuzzyGet === "function"
      && inner._fieldIds && fields.every((f) => typeof inner._fieldIds![f] === "number")
      && inner._fieldLength instanceof Map && Array.isArray(inner._avgFieldLength) && inner._documentIds instanceof Map
      && typeof inner._nextId === "number" && typeof inner._documentCount === "number";
    return looksRight ? new TopHits(inner as MiniInternals, fields, boosts) : null;
  }

  /** False once documents were discarded from the index: then MiniSearch's own search must answer. */
  get usable(): boolean {
    return this.mini._dirtCount === 0 && this.mini._documentCount === this.mini._documentIds.size;
  }

  /** The best `limit` documents for `query`, and how many matched in all. */
  search(query: string, options: TopHitsQuery): { total: number; hits: TopHit[] } {
    this.reset();
    const terms = this.tokenize(query).map((t) => this.processTerm(t)).filter((t): t is string => !!t);
    if (terms.length === 0) return { total: 0, hits: [] };
    const derived: string[] = [];
    const derivedIndex = new Map<string, number>();
    terms.forEach((term, spec) => {
      const firstOccurrence = terms.indexOf(term) === spec;
      for (const expansion of this.expand(term, options)) {
        let termIndex = derivedIndex.get(expansion.term);
        if (termIndex === undefined) {
          termIndex = derived.length;
          derived.push(expansion.term);
          derivedIndex.set(expansion.term, termIndex);
        }
        this.addPostings(expansion, termIndex, spec + 1, firstOccurrence);
      }
    });
    return this.best(terms.length, options, derived);
  }

  /** The query word itself, then longer words it begins (prefix), then near misses (fuzzy), as MiniSearch orders them. */
  private expand(term: string, options: TopHitsQuery): Expansion[] {
    const out: Expansion[] = [];
    const index = this.mini._index;
    const exact = index.get(term);
    if (exact) out.push({ term, weight: 1, postings: exact });
    const prefixed = new Set<string>();
    if (options.prefix) {
      for (const [word, postings] of index.atPrefix(term)) {
        const distance = word.length - term.length;
        if (!distance) continue;
        prefixed.add(word);
        out.push({ term: word, weight: (PREFIX_WEIGHT * word.length) / (word.length + 0.3 * distance), postings });
      }
    }
    const maxDistance = options.fuzzy ? options.fuzzy(term) : 0;
    if (maxDistance > 0) {
      for (const [word, [postings, distance]] of index.fuzzyGet(term, maxDistance)) {
        if (!distance || prefixed.has(word)) continue;
        out.push({ term: word, weight: (FUZZY_WEIGHT * word.length) / (word.length + distance), postings });
      }
    }
    return out;
  }

  private addPostings(expansion: Expansion, termIndex: number, spec: number, firstOccurrence: boolean): void {
    const total = this.mini._documentCount;
    for (let f = 0; f < this.fieldIds.length; f++) {
      const docs = expansion.postings.get(this.fieldIds[f]);
      if (!docs) continue;
      const idf = Math.log(1 + (total - docs.size + 0.5) / (docs.size + 0.5));
      const factor = expansion.weight * this.boosts[f] * idf;
      const norm = this.norms[f];
      for (const [doc, frequency] of docs) {
        this.score[doc] += factor * (BM25.d + (frequency * (BM25.k + 1)) / (frequency + norm[doc]));
        if (this.specStamp[doc] !== spec) {
          if (this.specCount[doc] === 0) this.touched[this.touchedCount++] = doc;
          this.specStamp[doc] = spec;
          this.specCount[doc]++;
          if (firstOccurrence) this.distinctCount[doc]++;
        }
        this.chain(doc, termIndex, f);
      }
    }
  }

  private chain(doc: number, termIndex: number, field: number): void {
    if (this.chainCount === this.chainTerm.length) {
      const grow = (a: Int32Array) => {
        const next = new Int32Array(a.length * 2);
        next.set(a);
        return next;
      };
      this.chainTerm = grow(this.chainTerm);
      this.chainField = grow(this.chainField);
      this.chainNext = grow(this.chainNext);
    }
    const at = this.chainCount++;
    this.chainTerm[at] = termIndex;
    this.chainField[at] = field;
    this.chainNext[at] = this.head[doc];
    this.head[doc] = at;
  }

  /** Keeps the best `limit` in a small sorted array: score first, then the order documents were first met. */
  private best(specs: number, options: TopHitsQuery, derived: string[]): { total: number; hits: TopHit[] } {
    const keep: number[] = [];
    const keptScore: number[] = [];
    let total = 0;
    for (let t = 0; t < this.touchedCount; t++) {
      const doc = this.touched[t];
      if (options.combineWith === "AND" && this.specCount[doc] !== specs) continue;
      if (options.filter && !options.filter(this.ids[doc])) continue;
      total++;
      const score = this.score[doc] * (this.distinctCount[doc] || 1);
      if (keep.length === options.limit && score <= keptScore[keep.length - 1]) continue;
      let at = keep.length;
      while (at > 0 && keptScore[at - 1] < score) at--;
      keep.splice(at, 0, doc);
      keptScore.splice(at, 0, score);
      if (keep.length > options.limit) {
        keep.pop();
        keptScore.pop();
      }
    }
    return { total, hits: keep.map((doc, i) => ({ id: this.ids[doc], score: keptScore[i], ...this.matchesOf(doc, derived) })) };
  }

  /** The chain is newest first; MiniSearch lists words and fields in the order they were met. */
  private matchesOf(doc: number, derived: string[]): { terms: string[]; fields: string[] } {
    const entries: number[] = [];
    for (let at = this.head[doc]; at !== -1; at = this.chainNext[at]) entries.push(at);
    const terms = new Set<string>();
    const fields = new Set<string>();
    for (let i = entries.length - 1; i >= 0; i--) {
      terms.add(derived[this.chainTerm[entries[i]]]);
      fields.add(this.fieldNames[this.chainField[entries[i]]]);
    }
    return { terms: [...terms], fields: [...fields] };
  }

  private reset(): void {
    for (let t = 0; t < this.touchedCount; t++) {
      const doc = this.touched[t];
      this.score[doc] = 0;
      this.specStamp[doc] = 0;
      this.specCount[doc] = 0;
      this.distinctCount[doc] = 0;
      this.head[doc] = -1;
    }
    this.touchedCount = 0;
    this.chainCount = 0;
  }
}
