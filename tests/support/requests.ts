import { NextRequest } from "next/server";
import { SESSION_COOKIE } from "@/lib/auth/lucia";

const BASE = "http://rootbench.local";

/** A request as the browser would send it from our own pages (same Origin as Host). */
export function request(path: string, init: { method?: string; token?: string; body?: unknown; origin?: string | null; headers?: Record<string, string> } = {}): NextRequest {
  const headers = new Headers(init.headers);
  headers.set("host", "rootbench.local");
  if (init.origin !== null) headers.set("origin", init.origin ?? BASE);
  if (init.token) headers.set("cookie", `${SESSION_COOKIE}=${init.token}`);
  let body: BodyInit | undefined;
  if (init.body instanceof FormData) body = init.body;
  else if (init.body !== undefined) {
    body = JSON.stringify(init.body);
    headers.set("content-type", "application/json");
  }
  return new NextRequest(new URL(path, BASE), { method: init.method ?? "GET", headers, body });
}

export function params<P>(value: P): { params: Promise<P> } {
  return { params: Promise.resolve(value) };
}
