import type { PostgresJsDatabase } from "drizzle-orm/postgres-js";
import { hashPassword } from "../../lib/auth/password";
import type * as schema from "../schema";
import { users } from "../schema";
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from "./accounts";

export async function seedUsers(db: PostgresJsDatabase<typeof schema>): Promise<void> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await db
    .insert(users)
    .values(DEMO_ACCOUNTS.map((a) => ({ id: a.id, role: a.role, name: a.name, email: a.email, passwordHash })))
    .onConflictDoNothing();
}
