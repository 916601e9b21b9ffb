import { eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { users } from "@/db/schema";
import { db } from "../../support/db";

// db/index.ts hands drizzle a client that names its statements, so postgres.js describes each one
// once per connection instead of before every execution (one round trip per query, not two).
describe("drizzle queries on the shared client", () => {
  it("run as named statements, inside transactions too, and a second run reuses the first's", async () => {
    const marker = `named-statement-probe-${Date.now()}`;
    const prepared = await db.transaction(async (tx) => {
      for (let i = 0; i < 2; i++) await tx.select({ id: users.id }).from(users).where(eq(users.email, marker));
      return tx.execute<{ n: number }>(sql`select count(*)::int as n from pg_prepared_statements
        where statement like ${'select "id" from "users" where "users"."email" = $1%'}`);
    });
    expect(prepared[0].n).toBe(1);
  });

  it("still send values as parameters, never spliced into the text", async () => {
    const hostile = `x'); drop table users; --`;
    const statements = await db.transaction(async (tx) => {
      expect(await tx.select().from(users).where(eq(users.name, hostile))).toEqual([]);
      return tx.execute<{ statement: string }>(sql`select statement from pg_prepared_statements where statement like ${'%"users"."name" = $1%'}`);
    });
    expect(statements.length).toBe(1);
    expect(statements[0].statement).not.toContain("drop table");
  });
});
