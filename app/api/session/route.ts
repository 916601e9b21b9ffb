import { NextResponse } from "next/server";
import { lucia } from "@/lib/auth/lucia";
import { route } from "@/lib/http/route";
import { hashToken } from "@/lib/auth/token";
import { SESSION_COOKIE } from "@/lib/auth/lucia";

/** Who is signed in (for client components through SWR). */
export const GET = route("home:read", async (_request, { user }) => NextResponse.json({ user }));

/** Signs the caller out of this session. */
export const DELETE = route("home:read", async (request) => {
  const token = request.cookies.get(SESSION_COOKIE)?.value;
  if (token) await lucia.invalidateSession(hashToken(token));
  const blank = lucia.createBlankSessionCookie();
  const response = NextResponse.json({ signedOut: true });
  response.cookies.set(blank.name, blank.value, blank.attributes);
  return response;
});
