import "server-only";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { sessions, users } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { hashPassword } from "@/lib/auth/password";
import { ALL_ROLES, type Role } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";
import { AppError, pgErrorCode } from "@/lib/errors";

const roleField = z.enum(ALL_ROLES as [Role, ...Role[]], { error: "Pick one of the roles." });
const userId = z.string().trim().min(1, "No user given.").max(64);

// Only an administrator may hand out or take away the administrator role.
function assertMayAssign(actor: SessionUser, role: Role, currentRole?: Role) {
  if ((role === "admin" || currentRole === "admin") && actor.role !== "admin") {
    throw new AppError("forbidden", "Only an administrator may grant or change the administrator role.");
  }
}

export const addUserInput = z.object({
  name: z.string().trim().min(1, "Enter a name.").max(120, "Keep the name under 120 characters."),
  email: z.string().trim().toLowerCase().max(200).pipe(z.email("That is not an e-mail address.")),
  role: roleField,
  password: z.string().min(10, "Use at least 10 characters.").max(200, "That password is too long."),
});

export const addUserAction = defineAction({
  name: "users.add",
  access: "users:manage",
  input: addUserInput,
  async run(input, { user }) {
    assertMayAssign(user, input.role);
    try {
      const id = randomUUID();
      await db.insert(users).values({ id, name: input.name, email: input.email, role: input.role, passwordHash: await hashPassword(input.password) });
      return { ok: true as const, data: { id }, message: `${input.name} can now sign in as ${input.role}.` };
    } catch (error) {
      if (pgErrorCode(error) === "23505") throw new AppError("conflict", "Someone already uses that e-mail address.", { fieldErrors: { email: "Already in use." } });
      throw error;
    }
  },
});

async function loadTarget(id: string) {
  const [target] = await db.select().from(users).where(eq(users.id, id)).limit(1);
  if (!target) throw new AppError("not_found", "That user does not exist.");
  return target;
}

export const changeRoleAction = defineAction({
  name: "users.changeRole",
  access: "users:manage",
  input: z.object({ userId, role: roleField }),
  async run(input, { user }) {
    if (input.userId === user.id) throw new AppError("forbidden", "You cannot change your own role.");
    const target = await loadTarget(input.userId);
    assertMayAssign(user, input.role, target.role);
    await db.update(users).set({ role: input.role }).where(eq(users.id, target.id));
    return { ok: true as const, data: { id: target.id }, message: `${target.name} is now ${input.role}.` };
  },
});

export const setActiveAction = defineAction({
  name: "users.setActive",
  access: "users:manage",
  input: z.object({ userId, active: z.enum(["true", "false"]).transform((v) => v === "true") }),
  async run(input, { user }) {
    if (input.userId === user.id) throw new AppError("forbidden", "You cannot deactivate your own account.");
    const target = await loadTarget(input.userId);
    assertMayAssign(user, target.role, target.role);
    await db.transaction(async (tx) => {
      await tx.update(users).set({ active: input.active }).where(eq(users.id, target.id));
      if (!input.active) await tx.delete(sessions).where(eq(sessions.userId, target.id));
    });
    return { ok: true as const, data: { id: target.id }, message: `${target.name} is ${input.active ? "active again" : "deactivated"}.` };
  },
});
