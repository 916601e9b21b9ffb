import "server-only";
import { inArray } from "drizzle-orm";
import { db } from "@/db";
import { uploads } from "@/db/schema";
import { blobStore, type BlobStore } from "./index";

const THUMB_SUFFIX = ".thumb.webp";
export const ORPHAN_AGE_MS = 60 * 60_000;

/**
 * Deletes stored files that no upload row points at and that are older than an hour. A photo is
 * written to storage before its row commits, so a younger file may still be about to get its row;
 * an older one belongs to an upload that failed or was rolled back.
 */
export async function sweepOrphans(store: BlobStore = blobStore(), now = Date.now()): Promise<string[]> {
  const old: string[] = [];
  for await (const o of store.list()) if (now - o.modifiedAt.getTime() > ORPHAN_AGE_MS) old.push(o.key);
  const removed: string[] = [];
  for (let i = 0; i < old.length; i += 500) {
    const chunk = old.slice(i, i + 500);
    const owners = chunk.map((key) => (key.endsWith(THUMB_SUFFIX) ? key.slice(0, -THUMB_SUFFIX.length) : key));
    const rows = await db.select({ key: uploads.storageKey }).from(uploads).where(inArray(uploads.storageKey, owners));
    const kept = new Set(rows.map((r) => r.key));
    for (let j = 0; j < chunk.length; j++) {
      if (kept.has(owners[j])) continue;
      await store.delete(chunk[j]);
      removed.push(chunk[j]);
    }
  }
  return removed;
}
