import "server-only";
import { createHash, createHmac, timingSafeEqual } from "node:crypto";
import { sharedSecret } from "@/lib/secrets";

/**
 * The preview → confirm hand-over. The server keeps no preview state: the preview answers with a
 * token signing (user, SHA-256 of the file, valid and skipped counts, expiry); the confirm sends the
 * same file back with the token, and the server re-checks every row before importing. The key is
 * IMPORT_SIGNING_KEY when set, else one the app keeps in PostgreSQL, so a preview made through one
 * app process can be confirmed through another, and survives a restart.
 */
const TOKEN_MINUTES = 30;
const key = () => sharedSecret("csv-import-signing", "IMPORT_SIGNING_KEY");

export interface ImportClaim {
  userId: string;
  sha256: string;
  valid: number;
  skipped: number;
  expires: number;
}

export const fileDigest = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

const mac = async (payload: string) => createHmac("sha256", await key()).update(payload).digest("base64url");

export async function signImport(claim: Omit<ImportClaim, "expires">, now = Date.now()): Promise<string> {
  const payload = Buffer.from(JSON.stringify({ ...claim, expires: now + TOKEN_MINUTES * 60_000 })).toString("base64url");
  return `${payload}.${await mac(payload)}`;
}

/** The claim, or a reason the token cannot be used. */
export async function verifyImport(token: string, now = Date.now()): Promise<ImportClaim | string> {
  const [payload, signature, extra] = token.split(".");
  if (!payload || !signature || extra !== undefined || token.length > 1000) return "The confirmation does not belong to a preview; check the file again.";
  const expected = Buffer.from(await mac(payload));
  const given = Buffer.from(signature);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) return "The confirmation does not belong to a preview; check the file again.";
  const claim = JSON.parse(Buffer.from(payload, "base64url").toString("utf8")) as ImportClaim;
  if (claim.expires < now) return "The preview is more than 30 minutes old; check the file again.";
  return claim;
}
