import "server-only";
import { DrizzlePostgreSQLAdapter } from "@lucia-auth/adapter-drizzle";
import { Lucia, TimeSpan } from "lucia";
import { db } from "@/db";
import { sessions, users, type Role, type Theme } from "@/db/schema";

const adapter = new DrizzlePostgreSQLAdapter(db, sessions, users);

export const SESSION_COOKIE = "rb_session";
/** Idle window: a session unused this long ends (lucia moves it on while in use). */
export const SESSION_LIFETIME = new TimeSpan(14, "d");
/** Absolute lifetime: however active, a session ends this long after sign-in. */
export const SESSION_ABSOLUTE_LIFETIME = new TimeSpan(30, "d");

export const lucia = new Lucia(adapter, {
  sessionExpiresIn: SESSION_LIFETIME,
  sessionCookie: {
    name: SESSION_COOKIE,
    expires: true,
    attributes: { secure: process.env.COOKIE_SECURE === "1", sameSite: "lax" },
  },
  getSessionAttributes: (attributes) => ({ createdAt: attributes.createdAt }),
  getUserAttributes: (attributes) => ({
    email: attributes.email,
    name: attributes.name,
    role: attributes.role,
    active: attributes.active,
    theme: attributes.theme,
  }),
});

declare module "lucia" {
  interface Register {
    Lucia: typeof lucia;
    DatabaseUserAttributes: { email: string; name: string; role: Role; active: boolean; theme: Theme };
    DatabaseSessionAttributes: { createdAt: Date };
  }
}
