import "server-only";
import { and, desc, eq, gt } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { accountTokens, users } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { consumeAccountToken, issueAccountToken, LINK_PROBLEM, lookUpAccountToken } from "@/lib/auth/account-tokens";
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { newPasswordField, passwordProblem } from "@/lib/auth/password-policy";
import { createSession, endSessionsOf } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { queueResetLink } from "./account-mail";

const emailField = z.string().trim().toLowerCase().min(1, "Enter your e-mail address.").max(200, "That address is too long.")
  .pipe(z.email("That is not an e-mail address."));

function checkNewPassword(password: string, confirm: string, email: string): void {
  const problem = passwordProblem(password, email);
  if (problem) throw new AppError("invalid", problem, { fieldErrors: { password: problem } });
  if (confirm !== password) throw new AppError("invalid", "The two passwords differ.", { fieldErrors: { confirm: "The two passwords differ." } });
}

/**
 * Sets a password from an invitation or reset link. The token is used up in the same
 * transaction that stores the password, and every session of the account ends.
 */
export const setPasswordFromLinkAction = defineAction({
  name: "auth.setPasswordFromLink",
  access: "public",
  input: z.object({
    token: z.string().min(1, "This link has no token.").max(200, "This link is not valid."),
    purpose: z.enum(["invite", "reset"], { error: "Unknown kind of link." }),
    password: newPasswordField,
    confirm: z.string().max(200),
  }),
  async run(input) {
    const found = await lookUpAccountToken(db, input.token, input.purpose);
    if (found.status !== "valid") throw new AppError("invalid", LINK_PROBLEM[found.status]);
    checkNewPassword(input.password, input.confirm, found.email);
    const passwordHash = await hashPassword(input.password);
    await db.transaction(async (tx) => {
      const userId = await consumeAccountToken(tx, input.token, input.purpose);
      if (userId !== found.userId) throw new AppError("invalid", LINK_PROBLEM.unknown);
      await tx.update(users).set({ passwordHash }).where(eq(users.id, userId));
      await tx.delete(accountTokens).where(eq(accountTokens.userId, userId));
      await endSessionsOf(tx, userId);
    });
    return { ok: true as const, data: { email: found.email }, message: "Your password is set. Sign in with it now." };
  },
});

const RESET_SENT = "If that address belongs to an account here, a link to choose a new password is on its way. It works for one hour.";
const RESEND_AFTER_MS = 60_000;

/** Asks for a reset link. The answer is the same whether or not the address has an account. */
export const requestResetAction = defineAction({
  name: "auth.requestReset",
  access: "public",
  input: z.object({ email: emailField }),
  async run(input) {
    await db.transaction(async (tx) => {
      const [user] = await tx.select().from(users).where(and(eq(users.email, input.email), eq(users.active, true))).for("update").limit(1);
      if (!user) return;
      // One mail a minute per account at most, so the form cannot flood someone's inbox.
      const [recent] = await tx.select({ at: accountTokens.createdAt }).from(accountTokens)
        .where(and(eq(accountTokens.userId, user.id), eq(accountTokens.purpose, "reset"), gt(accountTokens.createdAt, new Date(Date.now() - RESEND_AFTER_MS))))
        .orderBy(desc(accountTokens.createdAt)).limit(1);
      if (recent) return;
      const token = await issueAccountToken(tx, user.id, "reset");
      await queueResetLink(tx, user, token, "requested");
    });
    return { ok: true as const, data: { sent: true }, message: RESET_SENT };
  },
});

/** Changes one's own password: the current one is required, and every other session ends. */
export const changePasswordAction = defineAction({
  name: "account.changePassword",
  access: "account:edit",
  input: z.object({
    current: z.string().min(1, "Enter your current password.").max(200, "That password is too long."),
    password: newPasswordField,
    confirm: z.string().max(200),
  }),
  async run(input, { user }) {
    const [row] = await db.select().from(users).where(eq(users.id, user.id)).limit(1);
    if (!row || !(await verifyPassword(row.passwordHash, input.current))) {
      throw new AppError("invalid", "Your current password is not right.", { fieldErrors: { current: "Not your current password." } });
    }
    checkNewPassword(input.password, input.confirm, row.email);
    const passwordHash = await hashPassword(input.password);
    await db.transaction(async (tx) => {
      await tx.update(users).set({ passwordHash }).where(eq(users.id, user.id));
      await endSessionsOf(tx, user.id);
    });
    // A fresh session for this browser; every other one has ended.
    const { cookie } = await createSession(user.id);
    return { ok: true as const, data: { cookie }, message: "Password changed. You are signed out everywhere else." };
  },
});

/** Ends every session of the caller, this one included. */
export const signOutEverywhereAction = defineAction({
  name: "account.signOutEverywhere",
  access: "account:edit",
  input: z.object({}),
  async run(_input, { user }) {
    await endSessionsOf(db, user.id);
    return { ok: true as const, data: { id: user.id }, message: "Signed out everywhere." };
  },
});
