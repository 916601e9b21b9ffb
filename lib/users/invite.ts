import "server-only";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { users } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { issueAccountToken } from "@/lib/auth/account-tokens";
import { NO_PASSWORD } from "@/lib/auth/password";
import { ALL_ROLES, ROLE_LABELS, type Role } from "@/lib/auth/roles";
import { AppError } from "@/lib/errors";
import { queueInvitation } from "./account-mail";
import { assertMayAssign } from "./assign";

export const inviteInput = z.object({
  name: z.string().trim().min(1, "Enter a name.").max(120, "Keep the name under 120 characters."),
  email: z.string().trim().toLowerCase().min(1, "Enter an e-mail address.").max(200, "That address is too long.")
    .pipe(z.email("That is not an e-mail address.")),
  role: z.enum(ALL_ROLES as [Role, ...Role[]], { error: "Pick one of the roles." }),
});

/**
 * Invites a person with a role: the account exists at once without a password, and the e-mail
 * (queued through the outbox in the same transaction) carries a one-time link to choose one.
 * Inviting an address again while the invitation is open replaces the link (and name and role).
 */
export const inviteUserAction = defineAction({
  name: "users.invite",
  access: "users:manage",
  input: inviteInput,
  async run(input, { user }) {
    assertMayAssign(user, input.role);
    const id = await db.transaction(async (tx) => {
      const [existing] = await tx.select().from(users).where(eq(users.email, input.email)).for("update").limit(1);
      let userId: string;
      if (!existing) {
        userId = randomUUID();
        await tx.insert(users).values({ id: userId, name: input.name, email: input.email, role: input.role, passwordHash: NO_PASSWORD.invited })
          .onConflictDoNothing();
        const [created] = await tx.select({ id: users.id }).from(users).where(eq(users.email, input.email)).limit(1);
        if (created?.id !== userId) throw new AppError("conflict", "Someone else just invited that address; reload the page.");
      } else if (existing.passwordHash === NO_PASSWORD.invited) {
        assertMayAssign(user, input.role, existing.role);
        userId = existing.id;
        await tx.update(users).set({ name: input.name, role: input.role, active: true }).where(eq(users.id, userId));
      } else {
        throw new AppError("conflict", "That address already has an account.", { fieldErrors: { email: "Already has an account." } });
      }
      const token = await issueAccountToken(tx, userId, "invite");
      await queueInvitation(tx, { email: input.email, name: input.name, role: input.role }, user.name, token);
      return userId;
    });
    return { ok: true as const, data: { id }, message: `Invitation sent to ${input.email} as ${ROLE_LABELS[input.role]}; the link works for 72 hours.` };
  },
});
