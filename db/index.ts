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
    connection: {
      // JIT compiling costs tens of ms, more than it saves on report queries that run well under a second.
      jit: "off",
      // A prepared statement's generic plan (chosen after five runs) is made without the parameters: for a
      // report's period it guesses a few hundred rows and sorts the 100,000 it gets. Plan each run with its own.
      plan_cache_mode: "force_custom_plan",
    },
  });
globalForDb.rootbenchSql = sql;

/**
 * drizzle sends every query as an unnamed statement, which postgres.js must describe before it can
 * bind the parameters: two round trips per query. Named statements are described once per
 * connection and then take one. Queries without parameters keep the simple protocol.
 */
function namedStatements(client: Client): Client {
  return new Proxy(client, {
    get(target, property, receiver) {
      if (property === "unsafe") {
        return (query: string, params?: unknown[], options?: Record<string, unknown>) =>
          target.unsafe(query, params as never, { ...options, prepare: (params?.length ?? 0) > 0 });
      }
      if (property === "begin" || property === "savepoint") {
        const original = Reflect.get(target, property, receiver) as (...a: unknown[]) => unknown;
        return (...args: unknown[]) => {
          const last = args.length - 1;
          const body = args[last] as (tx: Client) => unknown;
          args[last] = (tx: Client) => body(namedStatements(tx));
          return original.apply(target, args);
        };
      }
      return Reflect.get(target, property, receiver);
    },
  });
}

export const db = drizzle(namedStatements(sql), { schema });
export type Db = typeof db;
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
