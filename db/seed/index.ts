import path from "node:path";
import { count } from "drizzle-orm";
import { db, sql } from "@/db";
import { users } from "@/db/schema";
import { loadContent } from "@/db/seed/content";
import { DEMO_ACCOUNTS } from "./accounts";
import { seedCatalogue } from "./catalogue";
import { seedHistory } from "./history";
import { seedTrees } from "./trees";
import { seedUsers } from "./users";
import { seedWriteups } from "./writeups";

/**
 * Seeds the invented demo workshop into an empty database, in one transaction: accounts,
 * catalogue, published trees and write-ups (and, unless `history: false`, the simulated past).
 * Does nothing when users already exist.
 */
export async function seed(options: { force?: boolean; contentDir?: string; history?: boolean } = {}): Promise<"seeded" | "skipped"> {
  const [{ n }] = await db.select({ n: count() }).from(users);
  if (n > 0 && !options.force) return "skipped";
  const content = loadContent(options.contentDir ?? path.join(__dirname, "../../content"));
  await db.transaction(async (tx) => {
    await seedUsers(tx);
    const catalogue = await seedCatalogue(tx, content);
    const senior = DEMO_ACCOUNTS.find((a) => a.role === "senior")!;
    const versionOf = await seedTrees(tx, content, catalogue.familyId, senior.id);
    const userOfRole = new Map(DEMO_ACCOUNTS.map((a) => [a.role as string, a.id]));
    await seedWriteups(tx, content, { ...catalogue, userOfRole });
    if (options.history !== false) await seedHistory(tx, content, { ...catalogue, userOfRole, versionOf });
  });
  return "seeded";
}

if (require.main === module) {
  const started = Date.now();
  seed()
    .then((result) => console.log(`seed ${result} in ${Date.now() - started} ms`))
    .catch((error: unknown) => {
      console.error("seed failed:", error);
      process.exitCode = 1;
    })
    .finally(() => sql.end());
}
