import postgres from "postgres";
import { sql } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { db } from "../../support/db";

// postgres.js 3.4.9 batches small writes behind setImmediate. When a transaction's connection
// is lost, the transaction body (or its ROLLBACK) still writes to that connection: unpatched, the
// write runs on a socket that is already gone and throws a TypeError from a timer callback, which
// no caller can catch and which ends the process (reported upstream as porsager/postgres#1154 and
// #1208). patches/postgres+3.4.9.patch rejects such a query with CONNECTION_CLOSED instead and
// drops the buffered bytes of a closed socket. An uncaught error here fails this file.
const admin = postgres(process.env.DATABASE_URL!, { max: 1, onnotice: () => {} });

afterAll(async () => {
  await admin.end({ timeout: 5 });
});

async function backendPid(tx: Parameters<Parameters<typeof db.transaction>[0]>[0]): Promise<number> {
  const [row] = await tx.execute<{ pid: number }>(sql`select pg_backend_pid() as pid`);
  return row.pid;
}

const nextTurns = () => new Promise((resolve) => setTimeout(resolve, 50));

describe("a lost database connection", () => {
  it("rejects the transaction that was using it, and the pool carries on", async () => {
    for (let i = 0; i < 5; i++) {
      const attempt = db.transaction(async (tx) => {
        const pid = await backendPid(tx);
        await admin`select pg_terminate_backend(${pid})`;
        await nextTurns();
        await tx.execute(sql`select 1`);
      });
      await expect(attempt).rejects.toThrow();
      await nextTurns();
    }
    const [row] = await db.execute<{ ok: number }>(sql`select 1 as ok`);
    expect(row.ok).toBe(1);
  });

  it("rejects a transaction whose query was running when the server ended it", async () => {
    for (let i = 0; i < 5; i++) {
      const attempt = db.transaction(async (tx) => {
        const pid = await backendPid(tx);
        setTimeout(() => void admin`select pg_terminate_backend(${pid})`.catch(() => {}), 30);
        await tx.execute(sql`select pg_sleep(2)`);
      });
      await expect(attempt).rejects.toThrow();
      await nextTurns();
    }
    const [row] = await db.execute<{ ok: number }>(sql`select 1 as ok`);
    expect(row.ok).toBe(1);
  });
});
