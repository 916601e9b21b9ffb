import { route } from "@/lib/http/route";
import { etagMatches } from "@/lib/search/etag";
import { currentWriteupIndex } from "@/lib/search/index-data";

const CACHING = { "Cache-Control": "private, no-cache", Vary: "Cookie, Accept-Encoding" };

// The browser keeps the body and revalidates with If-None-Match; an unchanged corpus costs a 304.
export const GET = route("writeup:read", async (request) => {
  const index = await currentWriteupIndex();
  if (etagMatches(request.headers.get("if-none-match"), index.etag)) {
    return new Response(null, { status: 304, headers: { ETag: index.etag, ...CACHING } });
  }
  const body = await index.body();
  const headers = { ETag: body.etag, ...CACHING, "Content-Type": "application/json; charset=utf-8" };
  // Sent gzipped when the browser takes it (they all do); built once per version, see IndexBody.
  if (/\bgzip\b/.test(request.headers.get("accept-encoding") ?? "")) {
    return new Response(new Uint8Array(body.gzip), { headers: { ...headers, "Content-Encoding": "gzip" } });
  }
  return new Response(body.json, { headers });
});
