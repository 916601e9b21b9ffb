const ORIGIN = "http://app.invalid";
const CONTROL_OR_BACKSLASH = /[\u0000-\u001F\u007F\\]/;

/**
 * Where to go after sign-in: a path of this app, or "/". Browsers read "//host", "/\host",
 * "/\t/host" and their percent-encoded forms as another site, so anything that is not plainly a
 * path (one leading slash, no backslash or control character, before or after decoding, and still
 * a same-origin path once resolved) is refused.
 */
export function safeNextPath(next: unknown): string {
  if (typeof next !== "string" || next.length === 0 || next.length > 500) return "/";
  if (!next.startsWith("/") || next.startsWith("//") || CONTROL_OR_BACKSLASH.test(next)) return "/";
  let decoded: string;
  try {
    decoded = decodeURIComponent(next);
  } catch {
    return "/";
  }
  if (decoded.startsWith("//") || CONTROL_OR_BACKSLASH.test(decoded)) return "/";
  let url: URL;
  try {
    url = new URL(next, ORIGIN);
  } catch {
    return "/";
  }
  if (url.origin !== ORIGIN) return "/";
  const path = url.pathname + url.search + url.hash;
  return path.startsWith("/") && !path.startsWith("//") ? path : "/";
}
