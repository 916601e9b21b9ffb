import { NextResponse, type NextRequest } from "next/server";
import { isSameOrigin } from "./lib/http/origin";
import { contentSecurityPolicy, strictTransportSecurity } from "./lib/http/security-headers";

const PUBLIC_PATHS = ["/sign-in", "/setup", "/invite", "/reset-password", "/api/health", "/favicon.ico", "/icon.svg", "/robots.txt"];

// Cheap, optimistic checks only; the real rules are enforced in lib/auth on every entry point.
// Also the per-request CSP nonce: Next reads it from the request's CSP header and stamps it on its scripts.
export function proxy(request: NextRequest) {
  const { pathname } = request.nextUrl;
  const write = request.method !== "GET" && request.method !== "HEAD";
  if (write && pathname.startsWith("/api/") && !isSameOrigin(request.headers)) {
    return withHeaders(NextResponse.json({ error: "Cross-origin requests are refused." }, { status: 403 }), null);
  }
  const isPublic = PUBLIC_PATHS.some((p) => pathname === p || pathname.startsWith(`${p}/`));
  if (!isPublic && !pathname.startsWith("/api/") && !request.cookies.has("rb_session") && request.method === "GET") {
    const url = request.nextUrl.clone();
    url.pathname = "/sign-in";
    url.search = pathname === "/" ? "" : `?next=${encodeURIComponent(pathname + request.nextUrl.search)}`;
    return withHeaders(NextResponse.redirect(url), null);
  }
  const csp = contentSecurityPolicy(btoa(crypto.randomUUID()));
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("content-security-policy", csp);
  return withHeaders(NextResponse.next({ request: { headers: requestHeaders } }), csp);
}

function withHeaders(response: NextResponse, csp: string | null): NextResponse {
  if (csp) response.headers.set("content-security-policy", csp);
  const hsts = strictTransportSecurity();
  if (hsts) response.headers.set("strict-transport-security", hsts);
  return response;
}

export const config = { matcher: ["/((?!_next/static|_next/image|fonts/).*)"] };
