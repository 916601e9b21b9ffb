import "server-only";
import { sql } from "drizzle-orm";
import { db, type Db, type Tx } from "@/db";
import { indexEtag, type IndexVersion } from "./etag";
import { markdownToPlainText } from "./plain-text";
import type { SearchDoc, WriteupIndexPayload } from "./types";
import { serializeIndex } from "./writeup-index";

/**
 * Count and latest change of the published write-ups, and a digest of the catalogue names their
 * index carries: one query over the write-ups' index and three small catalogue tables, cheap enough
 * for every request.
 */
export async function writeupIndexVersion(conn: Db | Tx = db): Promise<IndexVersion> {
  const [row] = await conn.execute<{ count: number; max: string | null; catalogue: string }>(sql`
    select count(*)::int as count, max(updated_at) as max,
      md5(concat_ws('#',
        (select string_agg(c.id || '/' || c.slug || '/' || c.name, '|' order by c.id) from causes c),
        (select string_agg(f.id || '/' || f.slug || '/' || f.name || ' ' || f.generation, '|' order by f.id) from motor_families f),
        (select string_agg(p.id || '/' || p.name, '|' order by p.id) from parts p))) as catalogue
    from writeups where status = 'published'`);
  return { count: row.count, maxUpdatedAt: row.max ? new Date(row.max) : null, catalogue: row.catalogue };
}

type Pair = [string, string];
interface Row extends Record<string, unknown> {
  id: number;
  title: string;
  summary: string;
  body: string;
  tags: string[];
  published_at: string | null;
  causes: Pair[];
  families: Pair[];
  parts: string[];
}

/** Every published write-up's searchable fields (drafts never leave the server this way) and their version. */
export async function writeupIndexDocs(): Promise<WriteupIndexPayload> {
  // One snapshot for the rows and the version that names them.
  const { version, rows } = await db.transaction(async (tx) => ({
    version: await writeupIndexVersion(tx),
    rows: await tx.execute<Row>(sql`
    select w.id, w.title, w.summary, w.body, w.tags, w.published_at,
      coalesce((select json_agg(json_build_array(c.slug, c.name) order by c.name)
        from writeup_causes wc join causes c on c.id = wc.cause_id where wc.writeup_id = w.id), '[]') as causes,
      coalesce((select json_agg(json_build_array(f.slug, f.name || ' ' || f.generation) order by f.name, f.generation)
        from writeup_families wf join motor_families f on f.id = wf.family_id where wf.writeup_id = w.id), '[]') as families,
      coalesce((select json_agg(p.name order by p.name)
        from writeup_parts wp join parts p on p.id = wp.part_id where wp.writeup_id = w.id), '[]') as parts
    from writeups w
    where w.status = 'published'
    order by w.published_at desc nulls last, w.id desc`),
  }), { isolationLevel: "repeatable read", accessMode: "read only" });
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
  return { version: indexEtag(version), docs, index: await serializeIndex(docs) };
}

// The last body built, by version. Safe to keep: the version names everything the body is made of
// (the published write-ups and the catalogue names they carry), so a body is never served for another.
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
