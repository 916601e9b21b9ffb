/**
 * Where uploaded bytes live, by key. The local disk is the default; an S3-compatible store can
 * implement the same three calls (PutObject, GetObject, DeleteObject) without the callers changing.
 */
export interface BlobStore {
  put(key: string, data: Uint8Array, meta?: { contentType?: string }): Promise<void>;
  /** The stored bytes, or null when nothing is stored under the key. */
  get(key: string): Promise<Buffer | null>;
  /** Removes the key; removing a key that does not exist is not an error. */
  delete(key: string): Promise<void>;
}

// Keys are slash-separated segments of safe characters, so no key can climb out of the store's root.
const KEY_PATTERN = /^[A-Za-z0-9][A-Za-z0-9._-]*(?:\/[A-Za-z0-9][A-Za-z0-9._-]*)*$/;

export function assertValidKey(key: string): void {
  if (key.length > 300 || !KEY_PATTERN.test(key) || key.split("/").some((segment) => segment.includes(".."))) {
    throw new Error(`Invalid storage key: ${JSON.stringify(key)}`);
  }
}
