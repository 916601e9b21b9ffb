import "server-only";
import type { SessionUser } from "@/lib/auth/session-user";
import { findViewableUpload, readUploadBytes } from "@/lib/storage/uploads";

/** Upload ids are random and files never change, so the browser may keep them for a year. */
export async function serveUpload(id: string, user: SessionUser, variant: "original" | "thumb"): Promise<Response> {
  const upload = await findViewableUpload(id, user);
  const { bytes, mime } = await readUploadBytes(upload, variant);
  const name = variant === "thumb" ? upload.originalName.replace(/\.[a-z0-9]+$/i, "") + "-thumb.webp" : upload.originalName;
  return new Response(new Uint8Array(bytes), {
    headers: {
      "Content-Type": mime,
      "Content-Length": String(bytes.byteLength),
      "X-Content-Type-Options": "nosniff",
      "Cache-Control": "private, max-age=31536000, immutable",
      "Content-Disposition": `inline; filename="${name.replace(/[^\x20-\x7e]/g, "_")}"`,
    },
  });
}
