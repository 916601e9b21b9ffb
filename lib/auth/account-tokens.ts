import "server-only";
import { and, eq, gt } from "drizzle-orm";
import type { Db, Tx } from "@/db";
import { accountTokens, users, type AccountTokenPurpose } from "@/db/schema";
import { hashToken, newSessionToken } from "./token";

/** How long a link works: an invitation three days, a password reset one hour. */
export const TOKEN_LIFETIME_MS: Record<AccountTokenPurpose, number> = {
  invite: 72 * 3_600_000,
  reset: 3_600_000,
};

/**
 * A new one-time link token for a user. Any earlier link of the same purpose stops working (a
 * re-invite or a second reset request replaces the first). Only the token's hash is stored.
 */
export async function issueAccountToken(tx: Tx, userId: string, purpose: AccountTokenPurpose, now = new Date()): Promise<string> {
  await tx.delete(accountTokens).where(and(eq(accountTokens.userId, userId), eq(accountTokens.purpose, purpose)));
  const token = newSessionToken();
  await tx.insert(accountTokens).values({
    id: hashToken(token), userId, purpose, expiresAt: new Date(now.getTime() + TOKEN_LIFETIME_MS[purpose]),
  });
  return token;
}

export type TokenLookup =
  | { status: "valid"; userId: string; email: string; name: string }
  | { status: "expired" | "unknown" };

/** What a link's token stands for, without using it up (for the page that shows the form). */
export async function lookUpAccountToken(conn: Db | Tx, token: string | undefined | null, purpose: AccountTokenPurpose, now = new Date()): Promise<TokenLookup> {
  if (!token || token.length > 200) return { status: "unknown" };
  const [row] = await conn
    .select({ userId: accountTokens.userId, expiresAt: accountTokens.expiresAt, email: users.email, name: users.name, active: users.active })
    .from(accountTokens)
    .innerJoin(users, eq(users.id, accountTokens.userId))
    .where(and(eq(accountTokens.id, hashToken(token)), eq(accountTokens.purpose, purpose)))
    .limit(1);
  if (!row || !row.active) return { status: "unknown" };
  if (row.expiresAt.getTime() <= now.getTime()) return { status: "expired" };
  return { status: "valid", userId: row.userId, email: row.email, name: row.name };
}

/**
 * Uses a token up: deletes it and returns its user when it was still valid. Two requests with the
 * same link cannot both get a user back: the delete lets only one of them see the row.
 */
export async function consumeAccountToken(tx: Tx, token: string, purpose: AccountTokenPurpose, now = new Date()): Promise<string | null> {
  const [row] = await tx
    .delete(accountTokens)
    .where(and(eq(accountTokens.id, hashToken(token)), eq(accountTokens.purpose, purpose), gt(accountTokens.expiresAt, now)))
    .returning({ userId: accountTokens.userId });
  return row?.userId ?? null;
}

export const LINK_PROBLEM: Record<"expired" | "unknown", string> = {
  expired: "This link has expired. Ask for a new one.",
  unknown: "This link does not work: it was used already, replaced by a newer one, or copied incompletely.",
};
