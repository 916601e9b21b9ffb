import { AppError } from "@/lib/errors";

/**
 * 10 MB (decimal) per file. It stays below the 10 MiB the Next proxy buffers of a request body,
 * so a file at the limit plus its multipart framing still arrives whole.
 */
export const MAX_UPLOAD_BYTES = 10_000_000;
/** Room for the multipart boundaries, headers and the small text fields around the file. */
export const MULTIPART_OVERHEAD_BYTES = 64 * 1024;

export function tooLarge(limit = MAX_UPLOAD_BYTES): AppError {
  return new AppError("too_large", `That file is larger than ${Math.round(limit / 1_000_000)} MB; photos must be ${Math.round(limit / 1_000_000)} MB or smaller.`);
}

/**
 * Reads a request body into memory, refusing (413) as soon as it passes `limit` bytes: a declared
 * Content-Length over the limit is refused before reading, a body without one is counted as it streams.
 */
export async function readBodyLimited(request: Request, limit: number): Promise<Uint8Array<ArrayBuffer>> {
  const declared = Number(request.headers.get("content-length") ?? "");
  if (Number.isFinite(declared) && declared > limit) throw tooLarge(limit - MULTIPART_OVERHEAD_BYTES);
  if (!request.body) return new Uint8Array(new ArrayBuffer(0));
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      await reader.cancel();
      throw tooLarge(limit - MULTIPART_OVERHEAD_BYTES);
    }
    chunks.push(value);
  }
  const body = new Uint8Array(new ArrayBuffer(total));
  let offset = 0;
  for (const chunk of chunks) {
    body.set(chunk, offset);
    offset += chunk.byteLength;
  }
  return body;
}
