import "server-only";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { users } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { AppError } from "@/lib/errors";
import { verifyAgainstNothing, verifyPassword } from "./password";
import { safeNextPath } from "./safe-next";
import { createSession, endSessionOfToken } from "./session";
import { lockAddress, markSucceeded, recordPendingAttempt, secondsToWait } from "./throttle";

export const signInInput = z.object({
  email: z.string().trim().toLowerCase().min(1, "Enter your e-mail address.").max(200, "That address is too long.")
    .pipe(z.email("That is not an e-mail address.")),
  password: z.string().min(1, "Enter your password.").max(200, "That password is too long."),
  next: z.string().max(500).optional(),
  /** Set by the server action from the request, never taken from the form. */
  source: z.string().max(100).optional(),
  /** The cookie token this browser held before: its session ends once the new one starts. */
  previousToken: z.string().max(200).optional(),
});
export type SignInInput = z.infer<typeof signInInput>;

export interface SignInResult {
  userId: string;
  token: string;
  cookie: Awaited<ReturnType<typeof createSession>>["cookie"];
  next: string;
}

function waitMessage(seconds: number): string {
  const amount = seconds < 90 ? `${seconds} second${seconds === 1 ? "" : "s"}` : `${Math.ceil(seconds / 60)} minutes`;
  return `Too many failed attempts. Try again in ${amount}.`;
}

export const signInAction = defineAction({
  name: "auth.signIn",
  access: "public",
  input: signInInput,
  async run(input): Promise<SignInResult> {
    const source = input.source || "unknown";
    const gate = await db.transaction(async (tx) => {
      await lockAddress(tx, input.email);
      const wait = await secondsToWait(tx, input.email, source);
      if (wait > 0) return { wait };
      return { wait: 0, attemptId: await recordPendingAttempt(tx, input.email, source) };
    });
    if (gate.attemptId === undefined) throw new AppError("too_many", waitMessage(gate.wait));

    // The same work whether or not the address exists, is active or has a password yet.
    const [user] = await db.select().from(users).where(eq(users.email, input.email)).limit(1);
    const matches = user ? await verifyPassword(user.passwordHash, input.password) : await verifyAgainstNothing(input.password);
    if (!matches || !user?.active) {
      throw new AppError("unauthorized", "That e-mail address and password do not match an active account.", {
        fieldErrors: { password: "Check the address and password." },
      });
    }
    await markSucceeded(db, gate.attemptId);
    await endSessionOfToken(input.previousToken);
    const { token, cookie } = await createSession(user.id);
    return { userId: user.id, token, cookie, next: safeNextPath(input.next) };
  },
});
