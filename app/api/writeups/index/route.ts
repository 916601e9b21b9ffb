import { route } from "@/lib/http/route";
import { etagMatches } from "@/lib/search/etag";
import { currentWriteupIndex } from "@/lib/search/index-data";

const CACHING = { "Cache-Control": "private, no-cache", Vary: "Cookie" };

// The browser keeps the body and revalidates with If-None-Match; an unchanged corpus costs a 304.
export const GET = route("writeup:read", async (request) => {
  const index = await currentWriteupIndex();
  if (etagMatches(request.headers.get("if-none-match"), index.etag)) {
    return new Response(null, { status: 304, headers: { ETag: index.etag, ...CACHING } });
  }
  const { etag, json } = await index.body();
  return new Response(json, { headers: { ETag: etag, ...CACHING, "Content-Type": "application/json; charset=utf-8" } });
});
