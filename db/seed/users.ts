import type { Tx } from "@/db";
import { hashPassword } from "@/lib/auth/password";
import { users } from "../schema";
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from "./accounts";

export async function seedUsers(tx: Tx): Promise<void> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await tx
    .insert(users)
    .values(DEMO_ACCOUNTS.map((a) => ({ id: a.id, role: a.role, name: a.name, email: a.email, passwordHash })))
    .onConflictDoNothing();
}
