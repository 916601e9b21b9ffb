/**
 * Where uploaded bytes live, by key: the local disk (one machine) or any S3-compatible store
 * (several app processes share one bucket). Callers never see which.
 */
export interface BlobStore {
  put(key: string, data: Uint8Array, meta?: { contentType?: string }): Promise<void>;
  /** The stored bytes, or null when nothing is stored under the key. */
  get(key: string): Promise<Buffer | null>;
  /** Removes the key; removing a key that does not exist is not an error. */
  delete(key: string): Promise<void>;
  /** Every stored key with the time it was written (for the orphan sweep and backups). */
  list(): AsyncIterable<StoredObject>;
}

export interface StoredObject {
  key: string;
  modifiedAt: Date;
}

// Keys are slash-separated segments of safe characters, so no key can climb out of the store's root.
const KEY_PATTERN = /^[A-Za-z0-9][A-Za-z0-9._-]*(?:\/[A-Za-z0-9][A-Za-z0-9._-]*)*$/;

export function assertValidKey(key: string): void {
  if (key.length > 300 || !KEY_PATTERN.test(key) || key.split("/").some((segment) => segment.includes(".."))) {
    throw new Error(`Invalid storage key: ${JSON.stringify(key)}`);
  }
}
