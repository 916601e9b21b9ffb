import "server-only";
import { createHash, createHmac, randomBytes, timingSafeEqual } from "node:crypto";

/**
 * The preview → confirm hand-over. The server keeps no preview state: the preview answers with a
 * token signing (user, SHA-256 of the file, valid and skipped counts, expiry); the confirm sends the
 * same file back with the token, and the server re-checks every row before importing. The key is
 * IMPORT_SIGNING_KEY when set (needed when several app processes serve one shop), else a random key
 * per process, so a preview does not survive a restart.
 */
const TOKEN_MINUTES = 30;
const holder = globalThis as unknown as { rootbenchImportKey?: Buffer };

function key(): Buffer {
  const configured = process.env.IMPORT_SIGNING_KEY;
  if (configured) return Buffer.from(configured, "utf8");
  return (holder.rootbenchImportKey ??= randomBytes(32));
}

export interface ImportClaim {
  userId: string;
  sha256: string;
  valid: number;
  skipped: number;
  expires: number;
}

export const fileDigest = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

const mac = (payload: string) => createHmac("sha256", key()).update(payload).digest("base64url");

export function signImport(claim: Omit<ImportClaim, "expires">, now = Date.now()): string {
  const payload = Buffer.from(JSON.stringify({ ...claim, expires: now + TOKEN_MINUTES * 60_000 })).toString("base64url");
  return `${payload}.${mac(payload)}`;
}

/** The claim, or a reason the token cannot be used. */
export function verifyImport(token: string, now = Date.now()): ImportClaim | string {
  const [payload, signature, extra] = token.split(".");
  if (!payload || !signature || extra !== undefined || token.length > 1000) return "The confirmation does not belong to a preview; check the file again.";
  const expected = Buffer.from(mac(payload));
  const given = Buffer.from(signature);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) return "The confirmation does not belong to a preview; check the file again.";
  const claim = JSON.parse(Buffer.from(payload, "base64url").toString("utf8")) as ImportClaim;
  if (claim.expires < now) return "The preview is more than 30 minutes old; check the file again.";
  return claim;
}
