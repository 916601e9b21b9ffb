import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import { authorize, type Access } from "@/lib/auth/authorize";
import { SESSION_COOKIE } from "@/lib/auth/lucia";
import { validateToken, type SessionUser } from "@/lib/auth/session";
import { isAppError } from "@/lib/errors";
import { isSameOrigin } from "./origin";

export interface RouteContext<P> {
  user: SessionUser;
  params: P;
}

export function jsonError(status: number, error: string, extra: Record<string, unknown> = {}): NextResponse {
  return NextResponse.json({ error, ...extra }, { status });
}

/**
 * Wraps a route handler: same-origin check for writes, then the caller's session (401) and role
 * (403). Record-level 404s are the handler's. Typed errors map to statuses; others stay on the server.
 */
export function route<P = Record<string, string>>(
  access: Access,
  handler: (request: NextRequest, ctx: RouteContext<P>) => Promise<Response>,
) {
  return async (request: NextRequest, context: { params: Promise<P> }): Promise<Response> => {
    if (request.method !== "GET" && request.method !== "HEAD" && !isSameOrigin(request.headers)) {
      return jsonError(403, "Cross-origin requests are refused.");
    }
    const session = await validateToken(request.cookies.get(SESSION_COOKIE)?.value);
    const user = session?.user ?? null;
    const verdict = authorize(user, access);
    if (verdict === 401) return jsonError(401, "Sign in first.");
    if (verdict === 403) return jsonError(403, "Your role may not use this.");
    try {
      const params = context?.params ? await context.params : ({} as P);
      return await handler(request, { user: user as SessionUser, params });
    } catch (error) {
      if (isAppError(error)) return jsonError(error.status, error.message, error.fieldErrors ? { fieldErrors: error.fieldErrors } : {});
      console.error(`route ${request.method} ${request.nextUrl.pathname} failed`, error);
      return jsonError(500, "Something went wrong on the server.");
    }
  };
}
