import "server-only";
import { cookies } from "next/headers";
import { cache } from "react";
import { hashToken, newSessionToken } from "./token";
import { lucia, SESSION_COOKIE } from "./lucia";
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

/** Looks a cookie token up; the database only ever sees its hash. Inactive users have no session. */
export async function validateToken(token: string | undefined | null): Promise<ValidatedSession | null> {
  if (!token || token.length > 200) return null;
  const { session, user } = await lucia.validateSession(hashToken(token));
  if (!session || !user) return null;
  if (!user.active) {
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
  await lucia.createSession(userId, {}, { sessionId: hashToken(token) });
  return { token, cookie: lucia.createSessionCookie(token) };
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

export async function signOutCurrent(): Promise<void> {
  const jar = await cookies();
  const session = await currentSession();
  if (session) await lucia.invalidateSession(session.sessionId);
  const blank = lucia.createBlankSessionCookie();
  jar.set(blank.name, blank.value, blank.attributes);
}
