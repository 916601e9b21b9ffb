import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import S3rver from "s3rver";
import sharp from "sharp";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { blobStore } from "@/lib/storage";
import { LocalDiskStore } from "@/lib/storage/local-disk";
import { S3Store } from "@/lib/storage/s3";
import type { BlobStore } from "@/lib/storage/store";
import { sweepOrphans } from "@/lib/storage/sweep";
import { readUploadBytes, storePhoto, thumbKeyOf } from "@/lib/storage/uploads";
import { createUser, truncateAll } from "../../support/db";

const dir = mkdtempSync(path.join(os.tmpdir(), "rootbench-s3-"));
const server = new S3rver({ port: 0, address: "127.0.0.1", directory: path.join(dir, "s3"), silent: true, configureBuckets: [{ name: "test-bucket", configs: [] }] });
const saved = { ...process.env };
let s3: S3Store;

beforeAll(async () => {
  const { port } = await server.run();
  Object.assign(process.env, {
    STORAGE: "s3", S3_ENDPOINT: `http://127.0.0.1:${port}`, S3_BUCKET: "test-bucket", S3_REGION: "us-east-1",
    S3_ACCESS_KEY_ID: "S3RVER", S3_SECRET_ACCESS_KEY: "S3RVER", S3_FORCE_PATH_STYLE: "1",
  });
  s3 = blobStore() as S3Store;
});

afterAll(async () => {
  process.env = saved;
  await server.close();
  rmSync(dir, { recursive: true, force: true });
});

const keysOf = async (store: BlobStore) => {
  const keys: string[] = [];
  for await (const o of store.list()) keys.push(o.key);
  return keys.sort();
};

beforeEach(async () => {
  await truncateAll();
  for (const key of await keysOf(s3)) await s3.delete(key);
});

describe.each([
  ["S3 (the fake S3 server)", () => s3],
  ["local disk", () => new LocalDiskStore(path.join(dir, "disk"))],
])("the %s store", (_name, storeOf) => {
  it("puts, gets, lists and deletes by key; a missing key reads as null", async () => {
    const store = storeOf();
    await store.put("photos/ab/one", new Uint8Array([1, 2, 3]), { contentType: "application/octet-stream" });
    await store.put("photos/cd/two.thumb.webp", new Uint8Array([4]));
    expect([...(await store.get("photos/ab/one"))!]).toEqual([1, 2, 3]);
    expect(await store.get("photos/ab/none")).toBeNull();
    expect(await keysOf(store)).toEqual(["photos/ab/one", "photos/cd/two.thumb.webp"]);
    await store.delete("photos/ab/one");
    await store.delete("photos/ab/one");
    expect(await store.get("photos/ab/one")).toBeNull();
    await store.delete("photos/cd/two.thumb.webp");
    expect(await keysOf(store)).toEqual([]);
  });

  it("refuses keys that could leave the store", async () => {
    await expect(storeOf().put("../etc/x", new Uint8Array([1]))).rejects.toThrow(/Invalid storage key/);
    await expect(storeOf().get("photos//x")).rejects.toThrow(/Invalid storage key/);
  });
});

describe("photos on S3", () => {
  it("are stored in the bucket with their thumbnail and read back through the upload record", async () => {
    const tech = await createUser("tech");
    const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: "#3c6b4a" } }).png().toBuffer();
    const upload = await storePhoto({ bytes: png, originalName: "bench.png", uploadedBy: tech.id });
    expect(await keysOf(s3)).toEqual([upload.storageKey, thumbKeyOf(upload.storageKey)].sort());
    const original = await readUploadBytes(upload, "original");
    expect(original.mime).toBe("image/png");
    expect((await readUploadBytes(upload, "thumb")).mime).toBe("image/webp");
  });

  it("the sweep removes files no upload points at once they are an hour old, and keeps the rest", async () => {
    const tech = await createUser("tech");
    const png = await sharp({ create: { width: 32, height: 32, channels: 3, background: "#6b3c4a" } }).png().toBuffer();
    const kept = await storePhoto({ bytes: png, originalName: "kept.png", uploadedBy: tech.id });
    await s3.put("photos/zz/orphan", new Uint8Array([1]));
    await s3.put("photos/zz/orphan.thumb.webp", new Uint8Array([2]));

    // Young orphans may still be waiting for their row to commit: left alone.
    expect(await sweepOrphans(s3)).toEqual([]);
    const later = Date.now() + 61 * 60_000;
    expect((await sweepOrphans(s3, later)).sort()).toEqual(["photos/zz/orphan", "photos/zz/orphan.thumb.webp"]);
    expect(await keysOf(s3)).toEqual([kept.storageKey, thumbKeyOf(kept.storageKey)].sort());
  });
});
