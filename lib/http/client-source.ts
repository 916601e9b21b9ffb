/**
 * The address a request came from, for throttling: the last X-Forwarded-For entry, which is the
 * one the nearest proxy added (Next adds the socket's address when no proxy did). Entries further
 * left were written by the client and are not trusted.
 */
export function clientSource(headers: Headers): string | undefined {
  const forwarded = headers.get("x-forwarded-for");
  const last = forwarded?.split(",").map((s) => s.trim()).filter(Boolean).pop();
  return last ? last.slice(0, 100) : undefined;
}
