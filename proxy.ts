import { NextResponse, type NextRequest } from "next/server";
import { isSameOrigin } from "./lib/http/origin";

const PUBLIC_PATHS = ["/sign-in", "/api/health", "/favicon.ico", "/icon.svg", "/robots.txt"];

// Cheap, optimistic checks only; the real rules are enforced in lib/auth on every entry point.
export function proxy(request: NextRequest) {
  const { pathname } = request.nextUrl;
  const write = request.method !== "GET" && request.method !== "HEAD";
  if (write && pathname.startsWith("/api/") && !isSameOrigin(request.headers)) {
    return NextResponse.json({ error: "Cross-origin requests are refused." }, { status: 403 });
  }
  const isPublic = PUBLIC_PATHS.some((p) => pathname === p || pathname.startsWith(`${p}/`));
  if (!isPublic && !pathname.startsWith("/api/") && !request.cookies.has("rb_session") && request.method === "GET") {
    const url = request.nextUrl.clone();
    url.pathname = "/sign-in";
    url.search = pathname === "/" ? "" : `?next=${encodeURIComponent(pathname + request.nextUrl.search)}`;
    return NextResponse.redirect(url);
  }
  return NextResponse.next();
}

export const config = { matcher: ["/((?!_next/static|_next/image|fonts/).*)"] };
