import type MiniSearch from "minisearch";

/** One published write-up as the search index sees it (GET /api/writeups/index). */
export interface SearchDoc {
  id: number;
  title: string;
  summary: string;
  /** The body as plain text, Markdown syntax removed. */
  text: string;
  causes: string[];
  causeSlugs: string[];
  parts: string[];
  families: string[];
  familySlugs: string[];
  tags: string[];
  publishedAt: string | null;
}

/** MiniSearch's own serialisation of an index (MiniSearch#toJSON), opaque to us. */
export type SerializedIndex = ReturnType<MiniSearch["toJSON"]>;

export interface WriteupIndexPayload {
  /** The ETag the server sent with these documents; equal versions mean equal documents. */
  version: string;
  docs: SearchDoc[];
  /** The search index of exactly these documents, built on the server. */
  index: SerializedIndex;
}

export interface SearchFilters {
  family?: string;
  cause?: string;
  tag?: string;
}
