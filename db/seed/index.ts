import { sql } from "drizzle-orm";
import { drizzle } from "drizzle-orm/postgres-js";
import postgres from "postgres";
import * as schema from "../schema";
import { databaseUrl } from "../url";
import { seedUsers } from "./users";

/** Seeds the demo workshop into an empty database; does nothing when users already exist. */
export async function seed(url = databaseUrl(), options: { force?: boolean } = {}): Promise<"seeded" | "skipped"> {
  const connection = postgres(url, { max: 1, onnotice: () => {} });
  const db = drizzle(connection, { schema });
  try {
    const [{ count }] = await db.execute<{ count: number }>(sql`select count(*)::int as count from users`);
    if (count > 0 && !options.force) return "skipped";
    await seedUsers(db);
    return "seeded";
  } finally {
    await connection.end();
  }
}

if (require.main === module) {
  const started = Date.now();
  seed()
    .then((result) => console.log(`seed ${result} in ${Date.now() - started} ms`))
    .catch((error: unknown) => {
      console.error("seed failed:", error);
      process.exit(1);
    });
}
