import { execFileSync } from "node:child_process";
import { createHash } from "node:crypto";
import { mkdirSync, mkdtempSync, readdirSync, rmSync, statSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { sql } from "drizzle-orm";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { blobStore } from "@/lib/storage";
import { storePhoto } from "@/lib/storage/uploads";
import { db, truncateAll } from "../../support/db";
import { resetToDemo } from "../../support/seed";

const ROOT = path.resolve(__dirname, "../../..");
const dir = mkdtempSync(path.join(os.tmpdir(), "rootbench-backup-"));
const uploadDir = path.join(dir, "uploads");
const env = { ...process.env, DB_CLUSTER: "test", DB_PORT: new URL(process.env.DATABASE_URL!).port, UPLOAD_DIR: uploadDir, STORAGE: "disk" };
const savedUploadDir = process.env.UPLOAD_DIR;

async function fileSums(): Promise<Record<string, string>> {
  const store = blobStore();
  const out: Record<string, string> = {};
  for await (const { key } of store.list()) out[key] = createHash("sha256").update((await store.get(key))!).digest("hex");
  return out;
}

function walk(folder: string): string[] {
  return readdirSync(folder, { recursive: true, withFileTypes: true }).map((e) => path.join(e.parentPath, e.name));
}

async function fingerprint(): Promise<Record<string, string>> {
  const tables = await db.execute<{ tablename: string }>(sql`select tablename from pg_tables where schemaname = 'public' order by 1`);
  const out: Record<string, string> = {};
  for (const { tablename } of tables) {
    const [row] = await db.execute<{ n: number; sum: string }>(sql.raw(
      `select count(*)::int as n, md5(coalesce(string_agg(t::text, '|' order by t::text), '')) as sum from "${tablename}" t`,
    ));
    out[tablename] = `${row.n}:${row.sum}`;
  }
  return out;
}

describe("backup and restore", () => {
  beforeAll(() => { process.env.UPLOAD_DIR = uploadDir; });
  afterAll(() => {
    if (savedUploadDir === undefined) delete process.env.UPLOAD_DIR; else process.env.UPLOAD_DIR = savedUploadDir;
    rmSync(dir, { recursive: true, force: true });
  });

  it("a backup, a wipe of rows and files, and a restore give back every table's rows and every file exactly", async () => {
    await resetToDemo();
    const png = await sharp({ create: { width: 40, height: 30, channels: 3, background: "#8c6b2a" } }).png().toBuffer();
    await storePhoto({ bytes: png, originalName: "kept.png", uploadedBy: null });
    const before = await fingerprint();
    const filesBefore = await fileSums();
    expect(Number(before.trees.split(":")[0])).toBeGreaterThan(0);
    expect(Object.keys(filesBefore).length).toBeGreaterThanOrEqual(2);

    const set = path.join(dir, "set");
    execFileSync("bash", ["scripts/db.sh", "backup", set], { cwd: ROOT, env, stdio: "pipe" });
    // Readable by its owner only: every file 600, every folder 700.
    for (const entry of [set, ...walk(set)]) {
      expect((statSync(entry).mode & 0o777).toString(8), entry).toBe(statSync(entry).isDirectory() ? "700" : "600");
    }

    await truncateAll();
    rmSync(uploadDir, { recursive: true, force: true });
    expect((await fingerprint()).trees.startsWith("0:")).toBe(true);
    expect(await fileSums()).toEqual({});

    execFileSync("bash", ["scripts/db.sh", "restore", set], { cwd: ROOT, env, stdio: "pipe" });
    expect(await fingerprint()).toEqual(before);
    expect(await fileSums()).toEqual(filesBefore);
  });

  it("the database password never appears on a command line", () => {
    const script = execFileSync("bash", ["-c", "grep -n 'pg_dump\\|pg_restore' scripts/db.sh"], { cwd: ROOT, encoding: "utf8" });
    for (const line of script.split("\n").filter((l) => /"\$BIN\/pg_(dump|restore)"/.test(l))) expect(line).toMatch(/with_passfile/);
  });

  it("a damaged backup file is refused and leaves the database as it was", async () => {
    const before = await fingerprint();
    const bad = path.join(dir, "bad");
    mkdirSync(path.join(bad, "files"), { recursive: true });
    writeFileSync(path.join(bad, "database.dump"), "this is not a backup");
    expect(() => execFileSync("bash", ["scripts/db.sh", "restore", bad], { cwd: ROOT, env, stdio: "pipe" })).toThrow();
    expect(await fingerprint()).toEqual(before);
  });
});
