import "server-only";
import { eq, sql } from "drizzle-orm";
import type { Db, Tx } from "@/db";
import { signInAttempts } from "@/db/schema";

/**
 * Sign-in throttling: growing delays, never a hard lock. Three counts, each over the last hour:
 * - this address from this source (since that pair last succeeded): a few free tries, then waits
 *   that double with each further failure;
 * - this source against any address: stops one machine from trying many accounts;
 * - this address from sources that never signed in to it: stops many machines from trying one
 *   account, while the owner, signing in from where they signed in before, is not held back.
 * A wait counts from the newest failure of its kind; attempts refused for waiting are not recorded
 * and cost no password check. Unknown addresses are counted like real ones, so the answers do not
 * tell them apart.
 */
export const THROTTLE = {
  windowMinutes: 60,
  /** Failures allowed before waits begin, per count. */
  free: { pair: 3, source: 20, account: 10 },
  baseSeconds: 1,
  maxSeconds: 15 * 60,
  /** A source that signed in to an account within this many days is "known" for it. */
  knownDays: 90,
} as const;

export function delaySeconds(failures: number, free: number): number {
  if (failures < free) return 0;
  return Math.min(THROTTLE.maxSeconds, THROTTLE.baseSeconds * 2 ** (failures - free));
}

interface Counts {
  pair_failures: number;
  pair_newest: Date | null;
  source_failures: number;
  source_newest: Date | null;
  account_failures: number;
  account_newest: Date | null;
  known_source: boolean;
}

/** Seconds this attempt must still wait, or 0. */
export async function secondsToWait(conn: Db | Tx, email: string, source: string, now = new Date()): Promise<number> {
  const since = new Date(now.getTime() - THROTTLE.windowMinutes * 60_000).toISOString();
  const knownSince = new Date(now.getTime() - THROTTLE.knownDays * 86_400_000).toISOString();
  const [c] = await conn.execute<Counts & Record<string, unknown>>(sql`
    with recent as (select email, ip, succeeded, at from sign_in_attempts
                    where at > ${since}::timestamptz and (email = ${email} or ip = ${source})),
    pair_ok as (select max(at) as at from recent where email = ${email} and ip = ${source} and succeeded),
    account_ok as (select max(at) as at from recent where email = ${email} and succeeded)
    select
      (select count(*)::int from recent, pair_ok where email = ${email} and ip = ${source} and not succeeded and (pair_ok.at is null or recent.at > pair_ok.at)) as pair_failures,
      (select max(recent.at) from recent, pair_ok where email = ${email} and ip = ${source} and not succeeded and (pair_ok.at is null or recent.at > pair_ok.at)) as pair_newest,
      (select count(*)::int from recent where ip = ${source} and not succeeded) as source_failures,
      (select max(at) from recent where ip = ${source} and not succeeded) as source_newest,
      (select count(*)::int from recent, account_ok where email = ${email} and not succeeded and (account_ok.at is null or recent.at > account_ok.at)) as account_failures,
      (select max(recent.at) from recent, account_ok where email = ${email} and not succeeded and (account_ok.at is null or recent.at > account_ok.at)) as account_newest,
      exists (select 1 from sign_in_attempts where email = ${email} and ip = ${source} and succeeded and at > ${knownSince}::timestamptz) as known_source`);
  const wait = (failures: number, newest: Date | string | null, free: number) => {
    const delay = delaySeconds(failures, free);
    if (!delay || !newest) return 0;
    return Math.max(0, Math.ceil((new Date(newest).getTime() + delay * 1000 - now.getTime()) / 1000));
  };
  return Math.max(
    wait(c.pair_failures, c.pair_newest, THROTTLE.free.pair),
    wait(c.source_failures, c.source_newest, THROTTLE.free.source),
    c.known_source ? 0 : wait(c.account_failures, c.account_newest, THROTTLE.free.account),
  );
}

/**
 * Records an attempt as failed before its password is checked, so parallel guesses all count;
 * `markSucceeded` turns it into a success afterwards.
 */
export async function recordPendingAttempt(tx: Tx, email: string, source: string): Promise<number> {
  const [row] = await tx.insert(signInAttempts).values({ email, succeeded: false, ip: source }).returning({ id: signInAttempts.id });
  return row.id;
}

export async function markSucceeded(conn: Db | Tx, attemptId: number): Promise<void> {
  await conn.update(signInAttempts).set({ succeeded: true }).where(eq(signInAttempts.id, attemptId));
}

/** Serialises the check-and-record step for one address so parallel guesses cannot slip past the count. */
export async function lockAddress(tx: Tx, email: string): Promise<void> {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${"signin:" + email}))`);
}
