import "server-only";
import { forbidden, redirect } from "next/navigation";
import { authorize } from "./authorize";
import type { Capability } from "./roles";
import { currentUser, type SessionUser } from "./session";

/** For pages: signed-out visitors go to sign-in, signed-in users without the right get a 403 page. */
export async function requireRole(capability: Capability, returnTo?: string): Promise<SessionUser> {
  const user = await currentUser();
  const verdict = authorize(user, capability);
  if (verdict === 401) redirect(returnTo ? `/sign-in?next=${encodeURIComponent(returnTo)}` : "/sign-in");
  if (verdict === 403) forbidden();
  return user as SessionUser;
}
