import "server-only";
import { and, eq, ne } from "drizzle-orm";
import { cookies } from "next/headers";
import { cache } from "react";
import type { Db, Tx } from "@/db";
import { sessions } from "@/db/schema";
import { hashToken, newSessionToken } from "./token";
import { lucia, SESSION_ABSOLUTE_LIFETIME, SESSION_COOKIE } from "./lucia";
import type { Theme } from "@/db/schema";
import type { SessionUser } from "./session-user";

export type { SessionUser };

export interface ValidatedSession {
  user: SessionUser;
  sessionId: string;
  fresh: boolean;
  /** The screen theme the person chose (kept with the account, read with the session). */
  theme: Theme;
}

/** True when a session signed in at `createdAt` is past the absolute lifetime. */
export function pastAbsoluteLifetime(createdAt: Date, now = Date.now()): boolean {
  return now - createdAt.getTime() >= SESSION_ABSOLUTE_LIFETIME.milliseconds();
}

/**
 * Looks a cookie token up; the database only ever sees its hash. Inactive users have no session,
 * and a session past the absolute lifetime ends however recently it was used.
 */
export async function validateToken(token: string | undefined | null): Promise<ValidatedSession | null> {
  if (!token || token.length > 200) return null;
  const { session, user } = await lucia.validateSession(hashToken(token));
  if (!session || !user) return null;
  if (!user.active || pastAbsoluteLifetime(session.createdAt)) {
    await lucia.invalidateSession(session.id);
    return null;
  }
  return {
    user: { id: user.id, email: user.email, name: user.name, role: user.role },
    sessionId: session.id,
    fresh: session.fresh,
    theme: user.theme,
  };
}

export async function createSession(userId: string): Promise<{ token: string; cookie: ReturnType<typeof lucia.createSessionCookie> }> {
  const token = newSessionToken();
  await lucia.createSession(userId, { createdAt: new Date() }, { sessionId: hashToken(token) });
  return { token, cookie: lucia.createSessionCookie(token) };
}

/** Ends the session a cookie token belongs to (a no-op for an unknown token). */
export async function endSessionOfToken(token: string | undefined | null): Promise<void> {
  if (token && token.length <= 200) await lucia.invalidateSession(hashToken(token));
}

/**
 * Ends every session of a user, or every one but `keepSessionId`. Call it inside the transaction
 * that changes what the sessions stood for (password, role, active flag).
 */
export async function endSessionsOf(conn: Db | Tx, userId: string, keepSessionId?: string): Promise<void> {
  await conn.delete(sessions).where(keepSessionId ? and(eq(sessions.userId, userId), ne(sessions.id, keepSessionId)) : eq(sessions.userId, userId));
}

/** The signed-in user of this request, once per request (React cache). */
export const currentSession = cache(async (): Promise<ValidatedSession | null> => {
  const jar = await cookies();
  const token = jar.get(SESSION_COOKIE)?.value;
  const validated = await validateToken(token);
  if (validated?.fresh && token) {
    // Extending the cookie only works in actions and route handlers; pages render without it.
    try {
      const cookie = lucia.createSessionCookie(token);
      jar.set(cookie.name, cookie.value, cookie.attributes);
    } catch {}
  }
  return validated;
});

export async function currentUser(): Promise<SessionUser | null> {
  return (await currentSession())?.user ?? null;
}

/** The cookie token of this request, for actions that replace or end the session. */
export async function currentToken(): Promise<string | undefined> {
  return (await cookies()).get(SESSION_COOKIE)?.value;
}

/** Puts a new session cookie on the response (after sign-in, setup or a password change). */
export async function setSessionCookie(cookie: ReturnType<typeof lucia.createSessionCookie>): Promise<void> {
  (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
}

export async function clearSessionCookie(): Promise<void> {
  const blank = lucia.createBlankSessionCookie();
  (await cookies()).set(blank.name, blank.value, blank.attributes);
}

export async function signOutCurrent(): Promise<void> {
  const session = await currentSession();
  if (session) await lucia.invalidateSession(session.sessionId);
  await clearSessionCookie();
}
