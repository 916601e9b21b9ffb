// Copies every stored file (local disk or S3 bucket, whichever STORAGE selects) to or from a folder:
//   tsx scripts/storage/files.ts export DIR   writes DIR/<key> for every key (files 600, folders 700)
//   tsx scripts/storage/files.ts import DIR   puts every file under DIR back into the store by its key
// Used by `npm run db:backup` / `db:restore` so a backup set holds the files with the rows.
import { chmod, mkdir, readdir, readFile, writeFile } from "node:fs/promises";
import path from "node:path";
import { blobStore } from "../../lib/storage";

async function exportTo(dir: string): Promise<number> {
  const store = blobStore();
  let n = 0;
  for await (const { key } of store.list()) {
    const bytes = await store.get(key);
    if (!bytes) continue;
    const file = path.join(dir, ...key.split("/"));
    await mkdir(path.dirname(file), { recursive: true, mode: 0o700 });
    await writeFile(file, bytes, { mode: 0o600 });
    await chmod(file, 0o600);
    n++;
  }
  return n;
}

async function importFrom(dir: string): Promise<number> {
  const store = blobStore();
  let n = 0;
  for (const entry of await readdir(dir, { recursive: true, withFileTypes: true })) {
    if (!entry.isFile()) continue;
    const file = path.join(entry.parentPath, entry.name);
    await store.put(path.relative(dir, file).split(path.sep).join("/"), await readFile(file));
    n++;
  }
  return n;
}

const [command, dir] = process.argv.slice(2);
if ((command !== "export" && command !== "import") || !dir) {
  console.error("usage: files.ts export|import DIR");
  process.exit(2);
}
(command === "export" ? exportTo(path.resolve(dir)) : importFrom(path.resolve(dir)))
  .then((n) => console.log(`[files] ${command === "export" ? "copied" : "restored"} ${n} stored files`))
  .catch((error: unknown) => {
    console.error(`[files] ${command} failed:`, error instanceof Error ? error.message : error);
    process.exit(1);
  });
