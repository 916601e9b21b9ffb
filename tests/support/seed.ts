import { seed } from "@/db/seed";
import { truncateAll } from "./db";

/** Empties the test database and loads the demo catalogue, accounts, trees and write-ups. */
export async function resetToDemo(): Promise<void> {
  await truncateAll();
  await seed({ force: true, history: false });
}
