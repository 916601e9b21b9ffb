import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { sql } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { db, truncateAll } from "../../support/db";
import { resetToDemo } from "../../support/seed";

const ROOT = path.resolve(__dirname, "../../..");
const dir = mkdtempSync(path.join(os.tmpdir(), "rootbench-backup-"));
const env = { ...process.env, DB_CLUSTER: "test", DB_PORT: new URL(process.env.DATABASE_URL!).port };

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
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it("a backup, a wipe and a restore give back every table's rows exactly", async () => {
    await resetToDemo();
    const before = await fingerprint();
    expect(Number(before.trees.split(":")[0])).toBeGreaterThan(0);
    const file = path.join(dir, "demo.dump");
    execFileSync("bash", ["scripts/db.sh", "backup", file], { cwd: ROOT, env, stdio: "pipe" });
    await truncateAll();
    expect((await fingerprint()).trees.startsWith("0:")).toBe(true);
    execFileSync("bash", ["scripts/db.sh", "restore", file], { cwd: ROOT, env, stdio: "pipe" });
    expect(await fingerprint()).toEqual(before);
  });

  it("a damaged backup file is refused and leaves the database as it was", async () => {
    const before = await fingerprint();
    const bad = path.join(dir, "bad.dump");
    writeFileSync(bad, "this is not a backup");
    expect(() => execFileSync("bash", ["scripts/db.sh", "restore", bad], { cwd: ROOT, env, stdio: "pipe" })).toThrow();
    expect(await fingerprint()).toEqual(before);
  });
});
