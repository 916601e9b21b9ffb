import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import { authorize, type Access } from "@/lib/auth/authorize";
import { SESSION_COOKIE } from "@/lib/auth/lucia";
import { validateToken, type SessionUser } from "@/lib/auth/session";
import { isAppError } from "@/lib/errors";
import { isSameOrigin } from "./origin";
import { logFailure } from "@/lib/log/failure";
import { CONTROL_CHARACTER_MESSAGE, fieldWithControlCharacter } from "@/lib/http/control-characters";

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
    const controlled = await controlCharacterIn(request);
    if (controlled) return jsonError(400, CONTROL_CHARACTER_MESSAGE, { fieldErrors: { [controlled]: CONTROL_CHARACTER_MESSAGE } });
    try {
      const params = context?.params ? await context.params : ({} as P);
      return await handler(request, { user: user as SessionUser, params });
    } catch (error) {
      if (isAppError(error)) return jsonError(error.status, error.message, error.fieldErrors ? { fieldErrors: error.fieldErrors } : {});
      logFailure(`route ${request.method} ${request.nextUrl.pathname} failed`, error);
      return jsonError(500, "Something went wrong on the server.");
    }
  };
}

/** Where the query string or a JSON body holds a control character, or null (other bodies are the handler's). */
async function controlCharacterIn(request: NextRequest): Promise<string | null> {
  const query = fieldWithControlCharacter(Object.fromEntries(request.nextUrl.searchParams));
  if (query) return query;
  if (!(request.headers.get("content-type") ?? "").includes("application/json")) return null;
  try {
    return fieldWithControlCharacter(await request.clone().json());
  } catch {
    return null; // not JSON: the handler answers that
  }
}
