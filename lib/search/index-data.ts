import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { indexEtag } from "./etag";
import { markdownToPlainText } from "./plain-text";
import type { SearchDoc, WriteupIndexPayload } from "./types";
import { serializeIndex } from "./writeup-index";
import { logFailure } from "@/lib/log/failure";

/** Count and latest change of the published write-ups: one indexed query, cheap enough for every request. */
export async function writeupIndexVersion(): Promise<{ count: number; maxUpdatedAt: Date | null }> {
  const [row] = await db.execute<{ count: number; max: string | null }>(
    sql`select count(*)::int as count, max(updated_at) as max from writeups where status = 'published'`,
  );
  return { count: row.count, maxUpdatedAt: row.max ? new Date(row.max) : null };
}

type Pair = [string, string];
interface Row extends Record<string, unknown> {
  id: number;
  title: string;
  summary: string;
  body: string;
  tags: string[];
  published_at: string | null;
  updated_at: string;
  causes: Pair[];
  families: Pair[];
  parts: string[];
}

/** Every published write-up's searchable fields (drafts never leave the server this way) and their version. */
export async function writeupIndexDocs(): Promise<WriteupIndexPayload> {
  const rows = await db.execute<Row>(sql`
    select w.id, w.title, w.summary, w.body, w.tags, w.published_at, w.updated_at,
      coalesce((select json_agg(json_build_array(c.slug, c.name) order by c.name)
        from writeup_causes wc join causes c on c.id = wc.cause_id where wc.writeup_id = w.id), '[]') as causes,
      coalesce((select json_agg(json_build_array(f.slug, f.name || ' ' || f.generation) order by f.name, f.generation)
        from writeup_families wf join motor_families f on f.id = wf.family_id where wf.writeup_id = w.id), '[]') as families,
      coalesce((select json_agg(p.name order by p.name)
        from writeup_parts wp join parts p on p.id = wp.part_id where wp.writeup_id = w.id), '[]') as parts
    from writeups w
    where w.status = 'published'
    order by w.published_at desc nulls last, w.id desc`);
  let maxUpdatedAt: Date | null = null;
  for (const r of rows) {
    const at = new Date(r.updated_at);
    if (!maxUpdatedAt || at > maxUpdatedAt) maxUpdatedAt = at;
  }
  const docs = rows.map((r): SearchDoc => ({
    id: r.id,
    title: r.title,
    summary: r.summary,
    text: markdownToPlainText(r.body),
    causes: r.causes.map((c) => c[1]),
    causeSlugs: r.causes.map((c) => c[0]),
    parts: r.parts,
    families: r.families.map((f) => f[1]),
    familySlugs: r.families.map((f) => f[0]),
    tags: r.tags,
    publishedAt: r.published_at ? new Date(r.published_at).toISOString() : null,
  }));
  return { version: indexEtag({ count: rows.length, maxUpdatedAt }), docs, index: await serializeIndex(docs) };
}

// The last body built, by version: an unchanged corpus is neither queried nor serialised again.
// A build in progress is shared, so requests arriving while it runs wait for the same one.
let cached: Promise<{ etag: string; json: string }> | null = null;
let cachedEtag: string | null = null;

/** The current version, cheaply; the body only when asked for, built from the same rows its ETag names. */
export async function currentWriteupIndex(): Promise<{ etag: string; body: () => Promise<{ etag: string; json: string }> }> {
  const etag = indexEtag(await writeupIndexVersion());
  return {
    etag,
    body: () => {
      if (cached && cachedEtag === etag) return cached;
      cachedEtag = etag;
      const building = writeupIndexDocs().then((payload) => ({ etag: payload.version, json: JSON.stringify(payload) }));
      cached = building;
      building.catch(() => {
        if (cached === building) cached = cachedEtag = null;
      });
      return building;
    },
  };
}

/**
 * Builds the body for the corpus as it is now, in the background: called after a publish, so the
 * next reader does not wait for the index of every write-up to be built (seconds at 10,000).
 */
export function prepareWriteupIndex(): void {
  void currentWriteupIndex().then((index) => index.body()).catch((error: unknown) => logFailure("write-up index build failed", error));
}
