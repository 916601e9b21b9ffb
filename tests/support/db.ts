import { sql } from "drizzle-orm";
import { db } from "@/db";
import { hashPassword } from "@/lib/auth/password";
import { createSession } from "@/lib/auth/session";
import type { SessionUser } from "@/lib/auth/session-user";
import { ALL_ROLES, type Role } from "@/lib/auth/roles";
import { users } from "@/db/schema";

export { db };

/** Empties every table of the test database (integration files run one at a time). */
export async function truncateAll(): Promise<void> {
  const rows = await db.execute<{ tablename: string }>(
    sql`select tablename from pg_tables where schemaname = 'public'`,
  );
  const names = rows.map((r) => `"${r.tablename}"`).join(", ");
  if (names) await db.execute(sql.raw(`truncate ${names} restart identity cascade`));
}

export const TEST_PASSWORD = "test-password-123";
let cachedHash: Promise<string> | null = null;

export async function createUser(role: Role, overrides: Partial<{ id: string; email: string; name: string; active: boolean }> = {}): Promise<SessionUser> {
  cachedHash ??= hashPassword(TEST_PASSWORD);
  const id = overrides.id ?? `test-${role}-${Math.random().toString(36).slice(2, 8)}`;
  const row = {
    id,
    email: overrides.email ?? `${id}@rootbench.test`,
    name: overrides.name ?? `Test ${role}`,
    role,
    active: overrides.active ?? true,
    passwordHash: await cachedHash,
  };
  await db.insert(users).values(row);
  return { id, email: row.email, name: row.name, role };
}

/** One user per role, each with a real session token (for route handler calls). */
export async function createRoleUsers(): Promise<Record<Role, SessionUser & { token: string }>> {
  const out = {} as Record<Role, SessionUser & { token: string }>;
  for (const role of ALL_ROLES) {
    const user = await createUser(role);
    const { token } = await createSession(user.id);
    out[role] = { ...user, token };
  }
  return out;
}

export async function countRows(table: string): Promise<number> {
  const [row] = await db.execute<{ n: number }>(sql.raw(`select count(*)::int as n from "${table}"`));
  return row.n;
}
