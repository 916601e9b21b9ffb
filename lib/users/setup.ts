import "server-only";
import { randomUUID } from "node:crypto";
import { count, sql } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { settings, users } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { hashPassword } from "@/lib/auth/password";
import { newPasswordField, passwordProblem } from "@/lib/auth/password-policy";
import { createSession } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";

const SETUP_KEY = "setup_done";

/** True until the first administrator exists: no user at all and setup never ran. */
export async function setupOpen(): Promise<boolean> {
  const [{ n }] = await db.select({ n: count() }).from(users);
  if (n > 0) return false;
  const done = await db.execute(sql`select 1 from settings where key = ${SETUP_KEY}`);
  return done.length === 0;
}

export const setupInput = z.object({
  name: z.string().trim().min(1, "Enter your name.").max(120, "Keep the name under 120 characters."),
  email: z.string().trim().toLowerCase().min(1, "Enter your e-mail address.").max(200, "That address is too long.")
    .pipe(z.email("That is not an e-mail address.")),
  password: newPasswordField,
  confirm: z.string().max(200),
  shopName: z.string().trim().min(1, "Enter the workshop's name.").max(120, "Keep the name under 120 characters."),
  shopEmail: z.string().trim().toLowerCase().min(1, "Enter the workshop's e-mail address.").max(200, "That address is too long.")
    .pipe(z.email("That is not an e-mail address.")),
});

const CLOSED = "This shop is set up already. Sign in, or ask an administrator to invite you.";

/**
 * Creates the first administrator of an empty shop and signs them in, once. The settings row is
 * the latch: of two setups racing, the second waits on its primary key and then finds it taken.
 */
export const setupAction = defineAction({
  name: "users.setup",
  access: "public",
  input: setupInput,
  async run(input) {
    const problem = passwordProblem(input.password, input.email);
    if (problem) throw new AppError("invalid", problem, { fieldErrors: { password: problem } });
    if (input.confirm !== input.password) throw new AppError("invalid", "The two passwords differ.", { fieldErrors: { confirm: "The two passwords differ." } });
    if (!(await setupOpen())) throw new AppError("conflict", CLOSED);
    const passwordHash = await hashPassword(input.password);
    const id = randomUUID();
    await db.transaction(async (tx) => {
      const [{ n }] = await tx.select({ n: count() }).from(users);
      const latched = await tx.insert(settings).values({ key: SETUP_KEY, value: { at: new Date().toISOString() } })
        .onConflictDoNothing().returning({ key: settings.key });
      if (n > 0 || latched.length === 0) throw new AppError("conflict", CLOSED);
      await tx.insert(users).values({ id, name: input.name, email: input.email, role: "admin", passwordHash });
      // The shop's own name and address sign its e-mail to customers (instead of the demo workshop's).
      await tx.insert(settings).values({ key: "workshop", value: { name: input.shopName, email: input.shopEmail, phone: "", openingHours: "" } })
        .onConflictDoUpdate({ target: settings.key, set: { value: { name: input.shopName, email: input.shopEmail, phone: "", openingHours: "" } } });
    });
    const { cookie } = await createSession(id);
    return { ok: true as const, data: { id, cookie }, message: "Your shop is ready." };
  },
});
