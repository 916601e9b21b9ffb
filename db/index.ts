import "server-only";
import { drizzle } from "drizzle-orm/postgres-js";
import postgres from "postgres";
import * as schema from "./schema";
import { databaseUrl } from "./url";

type Client = ReturnType<typeof postgres>;
const globalForDb = globalThis as unknown as { rootbenchSql?: Client };

// One pool per process; the dev server re-evaluates modules, so keep it on globalThis.
export const sql: Client =
  globalForDb.rootbenchSql ??
  postgres(databaseUrl(), {
    max: Number(process.env.DB_POOL_MAX ?? 10),
    idle_timeout: 30,
    connect_timeout: 5,
    onnotice: () => {},
  });
globalForDb.rootbenchSql = sql;

export const db = drizzle(sql, { schema });
export type Db = typeof db;
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
