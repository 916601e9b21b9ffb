import type { WriteupHit } from "@/lib/search/writeup-index";

/** Hits reduced to what a reader sees (order, write-up, score to 9 digits, matched words): a loaded index sums in another order. */
export function comparable(hits: WriteupHit[]) {
  return hits.map((h) => ({ id: h.doc.id, score: Number(h.score.toPrecision(9)), terms: [...h.terms].sort(), fields: [...h.fields].sort() }));
}
