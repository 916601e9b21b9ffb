import "server-only";
import { and, asc, count, eq, gt } from "drizzle-orm";
import { db } from "@/db";
import { sessions, users } from "@/db/schema";
import { NO_PASSWORD } from "@/lib/auth/password";

export type AccountState = "active" | "invited" | "must-reset" | "deactivated";

function stateOf(active: boolean, passwordHash: string): AccountState {
  if (!active) return "deactivated";
  if (passwordHash === NO_PASSWORD.invited) return "invited";
  if (passwordHash === NO_PASSWORD.reset) return "must-reset";
  return "active";
}

export async function listUsers() {
  const rows = await db
    .select({ id: users.id, email: users.email, name: users.name, role: users.role, active: users.active, createdAt: users.createdAt, passwordHash: users.passwordHash })
    .from(users)
    .orderBy(asc(users.name));
  return rows.map(({ passwordHash, ...row }) => ({ ...row, state: stateOf(row.active, passwordHash) }));
}
export type UserRow = Awaited<ReturnType<typeof listUsers>>[number];

/** How many live sessions a user has (for the account page). */
export async function liveSessionCount(userId: string): Promise<number> {
  const [{ n }] = await db.select({ n: count() }).from(sessions).where(and(eq(sessions.userId, userId), gt(sessions.expiresAt, new Date())));
  return n;
}
