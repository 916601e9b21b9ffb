import postgres from "postgres";
import { afterAll, describe, expect, it } from "vitest";
import { runMigrations } from "@/db/migrate";

const base = process.env.DATABASE_URL!;
const name = `rootbench_migrate_${process.pid}`;
const admin = postgres(base, { max: 1, onnotice: () => {} });

describe("migrations", () => {
  afterAll(async () => {
    await admin.unsafe(`drop database if exists ${name} with (force)`);
    await admin.end();
  });

  it("apply to an empty database, twice without harm, and freeze published tree versions", async () => {
    await admin.unsafe(`create database ${name}`);
    const url = base.replace(/\/[^/?]+(\?|$)/, `/${name}$1`);
    await runMigrations(url);
    await runMigrations(url);
    const conn = postgres(url, { max: 1, onnotice: () => {} });
    try {
      const tables = await conn`select tablename from pg_tables where schemaname = 'public' order by tablename`;
      const names = tables.map((t) => t.tablename);
      for (const t of ["users", "sessions", "trees", "tree_versions", "tree_nodes", "tree_options", "option_evidence", "cases", "case_steps", "writeups", "uploads", "mail_outbox"]) {
        expect(names).toContain(t);
      }
      const [tree] = await conn`insert into trees (slug, symptom, title) values ('t', 'noise', 'Noise') returning id`;
      const [version] = await conn`insert into tree_versions (tree_id, number, state) values (${tree.id}, 1, 'draft') returning id`;
      await conn`insert into tree_nodes (version_id, key, kind) values (${version.id}, 'root', 'question')`;
      await conn`update tree_versions set state = 'published' where id = ${version.id}`;
      await expect(conn`update tree_nodes set title = 'changed' where version_id = ${version.id}`).rejects.toThrow(/published/);
      await expect(conn`insert into tree_nodes (version_id, key, kind) values (${version.id}, 'late', 'question')`).rejects.toThrow(/published/);
      await expect(conn`update tree_versions set note = 'x' where id = ${version.id}`).rejects.toThrow(/published/);
    } finally {
      await conn.end();
    }
  });
});
