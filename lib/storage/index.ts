import path from "node:path";
import { LocalDiskStore } from "./local-disk";
import type { BlobStore } from "./store";

export type { BlobStore } from "./store";

const stores = new Map<string, BlobStore>();

/** The upload folder: UPLOAD_DIR, else .data/uploads in the project (read on each call, so tests can point it elsewhere). */
export function uploadRoot(): string {
  return path.resolve(process.env.UPLOAD_DIR ?? path.join(process.cwd(), ".data", "uploads"));
}

/** The configured store. Only the local disk exists today; an S3-compatible one would be chosen here. */
export function blobStore(): BlobStore {
  const root = uploadRoot();
  let store = stores.get(root);
  if (!store) {
    store = new LocalDiskStore(root);
    stores.set(root, store);
  }
  return store;
}
