import path from "node:path";
import { count, inArray, notInArray } from "drizzle-orm";
import { db, sql } from "@/db";
import { users } from "@/db/schema";
import { isDemoMode } from "@/lib/auth/demo-mode";
import { relearnAll } from "@/lib/review/learned";
import { loadContent } from "@/db/seed/content";
import { DEMO_ACCOUNTS } from "./accounts";
import { loadAssemblies, seedAssemblies } from "./assemblies";
import { loadBenchDemo, seedCompanions, seedShowcase } from "./bench-demo";
import { seedCatalogue } from "./catalogue";
import { seedHistory } from "./history";
import { seedTrees } from "./trees";
import { seedUsers } from "./users";
import { seedWriteups } from "./writeups";

/**
 * Seeds the invented demo workshop into an empty database, in one transaction: accounts,
 * catalogue, published trees and write-ups (and, unless `history: false`, the simulated past).
 * Does nothing when users already exist, never (even with `force`) when any of them is not a demo
 * account, and never outside demo mode (ROOTBENCH_DEMO=0): a real shop gets no shared password.
 */
export async function seed(options: { force?: boolean; contentDir?: string; history?: boolean } = {}): Promise<"seeded" | "skipped" | "not-demo"> {
  if (!isDemoMode()) return "not-demo";
  const demoIds = DEMO_ACCOUNTS.map((a) => a.id);
  const [{ real }] = await db.select({ real: count() }).from(users).where(notInArray(users.id, demoIds));
  if (real > 0) return "skipped";
  const [{ n }] = await db.select({ n: count() }).from(users);
  if (n > 0 && !options.force) return "skipped";
  const contentDir = options.contentDir ?? path.join(__dirname, "../../content");
  const content = loadContent(contentDir);
  const teardown = loadAssemblies(contentDir);
  await db.transaction(async (tx) => {
    await seedUsers(tx);
    const catalogue = await seedCatalogue(tx, content);
    await seedAssemblies(tx, teardown, catalogue);
    const senior = DEMO_ACCOUNTS.find((a) => a.role === "senior")!;
    const versionOf = await seedTrees(tx, content, catalogue.familyId, senior.id);
    const userOfRole = new Map(DEMO_ACCOUNTS.map((a) => [a.role as string, a.id]));
    await seedWriteups(tx, content, { ...catalogue, userOfRole });
    if (options.history !== false) {
      await seedHistory(tx, content, { ...catalogue, userOfRole, versionOf });
      const benchDemo = loadBenchDemo(contentDir);
      await seedCompanions(tx, benchDemo, { ...catalogue, userOfRole, versionOf });
      await seedShowcase(tx, benchDemo, { ...catalogue, userOfRole, versionOf });
    }
    await relearnAll(tx);
  });
  return "seeded";
}

/** Demo accounts in a database about to serve a real shop: they share a published password. */
export async function demoAccountsPresent(): Promise<number> {
  const [{ n }] = await db.select({ n: count() }).from(users).where(inArray(users.id, DEMO_ACCOUNTS.map((a) => a.id)));
  return n;
}

if (require.main === module) {
  const started = Date.now();
  (async () => {
    if (!isDemoMode() && (await demoAccountsPresent()) > 0) {
      console.error("This database holds the demo workshop, whose accounts share a published password. " +
        "A real shop (ROOTBENCH_DEMO=0) needs a database of its own: set DATABASE_URL to an empty one, or run `ROOTBENCH_DEMO=0 npm run db:reset`.");
      process.exitCode = 1;
      return;
    }
    const result = await seed();
    console.log(result === "not-demo" ? "seed skipped: ROOTBENCH_DEMO=0, a shop of its own (no demo data)" : `seed ${result} in ${Date.now() - started} ms`);
  })()
    .catch((error: unknown) => {
      console.error("seed failed:", error);
      process.exitCode = 1;
    })
    .finally(() => sql.end());
}
