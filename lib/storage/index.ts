import path from "node:path";
import { LocalDiskStore } from "./local-disk";
import { S3Store, s3SettingsFromEnv } from "./s3";
import type { BlobStore } from "./store";

export type { BlobStore } from "./store";

const stores = new Map<string, BlobStore>();

/** The upload folder: UPLOAD_DIR, else .data/uploads in the project (read on each call, so tests can point it elsewhere). */
export function uploadRoot(): string {
  return path.resolve(process.env.UPLOAD_DIR ?? path.join(process.cwd(), ".data", "uploads"));
}

/**
 * The configured store: STORAGE=s3 (see s3SettingsFromEnv) for several app processes sharing one
 * bucket, else the local disk. Read on each call, so tests can switch; one client per target.
 */
export function blobStore(): BlobStore {
  if (process.env.STORAGE === "s3") {
    const settings = s3SettingsFromEnv();
    const id = `s3:${settings.endpoint ?? ""}:${settings.bucket}`;
    let store = stores.get(id);
    if (!store) {
      store = new S3Store(settings);
      stores.set(id, store);
    }
    return store;
  }
  const root = uploadRoot();
  let store = stores.get(root);
  if (!store) {
    store = new LocalDiskStore(root);
    stores.set(root, store);
  }
  return store;
}
