import "server-only";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { users } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { AppError } from "@/lib/errors";
import { verifyAgainstNothing, verifyPassword } from "./password";
import { createSession } from "./session";
import { lockAddress, lockMinutesLeft, recordAttempt } from "./throttle";

export const signInInput = z.object({
  email: z.string().trim().toLowerCase().min(1, "Enter your e-mail address.").max(200, "That address is too long.")
    .pipe(z.email("That is not an e-mail address.")),
  password: z.string().min(1, "Enter your password.").max(200, "That password is too long."),
  next: z.string().max(500).optional(),
  ip: z.string().max(100).optional(),
});
export type SignInInput = z.infer<typeof signInInput>;

export interface SignInResult {
  userId: string;
  token: string;
  cookie: Awaited<ReturnType<typeof createSession>>["cookie"];
  next: string;
}

function safeNext(next: string | undefined): string {
  return next && next.startsWith("/") && !next.startsWith("//") ? next : "/";
}

export const signInAction = defineAction({
  name: "auth.signIn",
  access: "public",
  input: signInInput,
  async run(input): Promise<SignInResult> {
    const verdict = await db.transaction(async (tx) => {
      await lockAddress(tx, input.email);
      const minutes = await lockMinutesLeft(tx, input.email);
      if (minutes > 0) return { kind: "locked" as const, minutes };
      const [user] = await tx.select().from(users).where(eq(users.email, input.email)).limit(1);
      const ok = user ? await verifyPassword(user.passwordHash, input.password) : await verifyAgainstNothing(input.password);
      const accepted = ok && !!user && user.active;
      await recordAttempt(tx, input.email, accepted, input.ip ?? null);
      return accepted ? { kind: "ok" as const, userId: user.id } : { kind: "bad" as const };
    });
    if (verdict.kind === "locked") {
      throw new AppError("too_many", `Too many failed attempts for this address. Try again in ${verdict.minutes} minute${verdict.minutes === 1 ? "" : "s"}.`);
    }
    if (verdict.kind === "bad") {
      throw new AppError("unauthorized", "That e-mail address and password do not match an active account.", {
        fieldErrors: { password: "Check the address and password." },
      });
    }
    const { token, cookie } = await createSession(verdict.userId);
    return { userId: verdict.userId, token, cookie, next: safeNext(input.next) };
  },
});
