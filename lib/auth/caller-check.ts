import "server-only";
import type { PendingQuery, Row, Sql } from "postgres";
import { CAPABILITIES, type Capability, type Role } from "./roles";
import { SESSION_ABSOLUTE_LIFETIME, SESSION_LIFETIME } from "./lucia";
import { hashToken } from "./token";

/**
 * What a statement that checks its own caller looks for: the stored session id (the hash of the
 * cookie token, as validateToken uses it) and the roles the capability allows (CAPABILITIES, the
 * one role table). Null when there is no token worth looking up.
 */
export interface CallerCheck {
  sessionId: string;
  roles: readonly Role[];
}

export function callerCheck(token: string | undefined | null, capability: Capability): CallerCheck | null {
  if (!token || token.length > 200) return null;
  return { sessionId: hashToken(token), roles: CAPABILITIES[capability] };
}

/**
 * The caller's row, for a CTE: at most one (user_id, expires_at), and only for a session that
 * has not expired (idle window and absolute lifetime), of an active user, whose role the capability allows. These are the rules of
 * validateToken (lucia's validateSession plus the active flag) and authorize(), so a statement
 * built on it writes exactly when the ordinary path would have let the caller in.
 */
export function callerRow(sql: Sql, check: CallerCheck): PendingQuery<Row[]> {
  return sql`
    select u.id as user_id, s.expires_at from sessions s join users u on u.id = s.user_id
    where s.id = ${check.sessionId} and s.expires_at > now()
      and s.created_at > now() - make_interval(secs => ${SESSION_ABSOLUTE_LIFETIME.seconds()})
      and u.active and u.role = any(${sql.array([...check.roles])}::text[])`;
}

/** lucia extends a session once less than half its lifetime is left; so does the one-trip path. */
export function sessionWantsExtending(expiresAt: Date, now = Date.now()): boolean {
  return expiresAt.getTime() - now < SESSION_LIFETIME.milliseconds() / 2;
}
