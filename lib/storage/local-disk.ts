import { randomBytes } from "node:crypto";
import { mkdir, readdir, readFile, rename, rm, stat, writeFile } from "node:fs/promises";
import path from "node:path";
import { assertValidKey, type BlobStore, type StoredObject } from "./store";

/** Files under one root folder; writes go to a temporary name first so a reader never sees half a file. */
export class LocalDiskStore implements BlobStore {
  constructor(readonly root: string) {}

  private fileOf(key: string): string {
    assertValidKey(key);
    return path.join(this.root, ...key.split("/"));
  }

  async put(key: string, data: Uint8Array): Promise<void> {
    const file = this.fileOf(key);
    await mkdir(path.dirname(file), { recursive: true });
    const temporary = `${file}.${randomBytes(6).toString("hex")}.partial`;
    try {
      await writeFile(temporary, data, { flag: "wx" });
      await rename(temporary, file);
    } catch (error) {
      await rm(temporary, { force: true });
      throw error;
    }
  }

  async get(key: string): Promise<Buffer | null> {
    try {
      return await readFile(this.fileOf(key));
    } catch (error) {
      if (typeof error === "object" && error && "code" in error && error.code === "ENOENT") return null;
      throw error;
    }
  }

  async delete(key: string): Promise<void> {
    await rm(this.fileOf(key), { force: true });
  }

  async *list(): AsyncIterable<StoredObject> {
    let entries;
    try {
      entries = await readdir(this.root, { recursive: true, withFileTypes: true });
    } catch (error) {
      if (typeof error === "object" && error && "code" in error && error.code === "ENOENT") return;
      throw error;
    }
    for (const entry of entries) {
      if (!entry.isFile()) continue;
      const file = path.join(entry.parentPath, entry.name);
      const key = path.relative(this.root, file).split(path.sep).join("/");
      yield { key, modifiedAt: (await stat(file)).mtime };
    }
  }
}
