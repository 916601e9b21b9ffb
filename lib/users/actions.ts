import "server-only";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { users } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { issueAccountToken } from "@/lib/auth/account-tokens";
import { NO_PASSWORD } from "@/lib/auth/password";
import { ALL_ROLES, ROLE_LABELS, type Role } from "@/lib/auth/roles";
import { endSessionsOf } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { queueResetLink } from "./account-mail";
import { assertMayAssign } from "./assign";

const roleField = z.enum(ALL_ROLES as [Role, ...Role[]], { error: "Pick one of the roles." });
const userId = z.string().trim().min(1, "No user given.").max(64);

async function loadTarget(id: string) {
  const [target] = await db.select().from(users).where(eq(users.id, id)).limit(1);
  if (!target) throw new AppError("not_found", "That user does not exist.");
  return target;
}

/** A new role takes effect at once: the person's sessions end and they sign in again under it. */
export const changeRoleAction = defineAction({
  name: "users.changeRole",
  access: "users:manage",
  input: z.object({ userId, role: roleField }),
  async run(input, { user }) {
    if (input.userId === user.id) throw new AppError("forbidden", "You cannot change your own role.");
    const target = await loadTarget(input.userId);
    assertMayAssign(user, input.role, target.role);
    if (target.role !== input.role) {
      await db.transaction(async (tx) => {
        await tx.update(users).set({ role: input.role }).where(eq(users.id, target.id));
        await endSessionsOf(tx, target.id);
      });
    }
    return { ok: true as const, data: { id: target.id }, message: `${target.name} is now ${ROLE_LABELS[input.role]}.` };
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
      if (!input.active) await endSessionsOf(tx, target.id);
    });
    return { ok: true as const, data: { id: target.id }, message: `${target.name} is ${input.active ? "active again" : "deactivated"}.` };
  },
});

/**
 * An administrator's forced reset: the old password stops working and every session ends at
 * once; the person gets a one-time link to choose a new password.
 */
export const forceResetAction = defineAction({
  name: "users.forceReset",
  access: "users:force-reset",
  input: z.object({ userId }),
  async run(input, { user }) {
    if (input.userId === user.id) throw new AppError("forbidden", "Change your own password on your account page.");
    const target = await loadTarget(input.userId);
    if (!target.active) throw new AppError("conflict", "That account is deactivated; reactivate it first.");
    if (target.passwordHash === NO_PASSWORD.invited) throw new AppError("conflict", "That person has not accepted the invitation yet; invite them again instead.");
    await db.transaction(async (tx) => {
      await tx.update(users).set({ passwordHash: NO_PASSWORD.reset }).where(eq(users.id, target.id));
      await endSessionsOf(tx, target.id);
      const token = await issueAccountToken(tx, target.id, "reset");
      await queueResetLink(tx, target, token, "forced");
    });
    return { ok: true as const, data: { id: target.id }, message: `${target.name} is signed out everywhere and has been sent a link to choose a new password.` };
  },
});
