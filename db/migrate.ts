import { drizzle } from "drizzle-orm/postgres-js";
import { migrate } from "drizzle-orm/postgres-js/migrator";
import path from "node:path";
import postgres from "postgres";
import { databaseUrl } from "./url";

/** Applies db/migrations over one connection; safe to run on every start. */
export async function runMigrations(url = databaseUrl()): Promise<void> {
  const connection = postgres(url, { max: 1, onnotice: () => {} });
  try {
    await migrate(drizzle(connection), { migrationsFolder: path.join(__dirname, "migrations") });
  } finally {
    await connection.end();
  }
}

if (require.main === module) {
  const started = Date.now();
  runMigrations()
    .then(async () => {
      // Tables of learned likelihoods a database from before they were stored lacks (needs the engine, so not SQL).
      // Likewise the planned teardown minutes of bench outcomes saved before they were stored.
      const { relearnMissing } = await import("../lib/review/learned");
      const { plannedTeardownMissing } = await import("../lib/bench/planned-teardown");
      const { sql } = await import("./index");
      const [learned, planned] = await Promise.all([relearnMissing(), plannedTeardownMissing()]).finally(() => sql.end({ timeout: 5 }));
      console.log(`migrations applied in ${Date.now() - started} ms${learned ? `; likelihoods learned for ${learned} tree version${learned === 1 ? "" : "s"}` : ""}` +
        `${planned ? `; teardown planned for ${planned} bench outcome${planned === 1 ? "" : "s"}` : ""}`);
    })
    .catch((error: unknown) => {
      console.error("migration failed:", error instanceof Error ? error.message : error);
      process.exit(1);
    });
}
