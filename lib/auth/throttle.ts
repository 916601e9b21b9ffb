import "server-only";
import { and, desc, eq, gt, sql } from "drizzle-orm";
import type { Tx } from "@/db";
import { signInAttempts } from "@/db/schema";

export const THROTTLE = { maxFailures: 5, windowMinutes: 15, lockMinutes: 15 } as const;

/**
 * Minutes left on a lock for this address, or 0. Locked when the last `maxFailures` failures all
 * fall within the window; the lock lasts `lockMinutes` from the newest of them.
 */
export async function lockMinutesLeft(tx: Tx, email: string, now = new Date()): Promise<number> {
  const since = new Date(now.getTime() - THROTTLE.windowMinutes * 60_000);
  const recent = await tx
    .select({ at: signInAttempts.at, succeeded: signInAttempts.succeeded })
    .from(signInAttempts)
    .where(and(eq(signInAttempts.email, email), gt(signInAttempts.at, since)))
    .orderBy(desc(signInAttempts.at))
    .limit(THROTTLE.maxFailures);
  const failuresInRow = recent.findIndex((r) => r.succeeded);
  const failures = failuresInRow === -1 ? recent.length : failuresInRow;
  if (failures < THROTTLE.maxFailures) return 0;
  const newest = recent[0].at.getTime();
  const until = newest + THROTTLE.lockMinutes * 60_000;
  return Math.max(1, Math.ceil((until - now.getTime()) / 60_000));
}

export async function recordAttempt(tx: Tx, email: string, succeeded: boolean, ip: string | null): Promise<void> {
  await tx.insert(signInAttempts).values({ email, succeeded, ip });
}

/** Serialises attempts for one address so parallel guesses cannot slip past the count. */
export async function lockAddress(tx: Tx, email: string): Promise<void> {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${"signin:" + email}))`);
}
