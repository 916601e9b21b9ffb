import "server-only";
import { randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { db, type Db, type Tx } from "@/db";
import { uploads, writeups, type Upload } from "@/db/schema";
import { may } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";
import { AppError } from "@/lib/errors";
import { mayReadWriteup } from "@/lib/writeups/access";
import { mayUpload } from "./access";
import { examinePhoto, THUMB_MIME } from "./images";
import { blobStore } from "./index";
import { MAX_UPLOAD_BYTES, tooLarge } from "./limits";
import { describeKind, isPhotoKind, sniff } from "./sniff";
import { UPLOAD_ID_PATTERN } from "./urls";

export const newUploadId = () => randomBytes(16).toString("hex");

function newStorageKey(folder: string): string {
  const name = randomBytes(16).toString("hex");
  return `${folder}/${name.slice(0, 2)}/${name}`;
}

export const thumbKeyOf = (storageKey: string) => `${storageKey}.thumb.webp`;

/** A file name fit to keep and to echo in a Content-Disposition header. */
export function cleanFileName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? "";
  const clean = base.replace(/[\u0000-\u001f\u007f"]/g, "").trim().slice(0, 200);
  return clean || "photo";
}

export interface NewPhoto {
  bytes: Uint8Array;
  originalName: string;
  uploadedBy: string | null;
  caseId?: number | null;
  writeupId?: number | null;
  /** Normally random; the seed passes a content-derived key so re-seeding does not pile up copies. */
  storageKey?: string;
}

/**
 * Checks a photo (type by its bytes, size, decodable), then stores it and its thumbnail and records
 * it. Nothing reaches the store before every check has passed.
 */
export async function storePhoto(input: NewPhoto, conn: Db | Tx = db): Promise<Upload> {
  const name = cleanFileName(input.originalName);
  if (input.bytes.byteLength === 0) throw new AppError("bad_request", "That file is empty.");
  if (input.bytes.byteLength > MAX_UPLOAD_BYTES) throw tooLarge();
  const { kind, mime } = sniff(input.bytes);
  if (!isPhotoKind(kind)) {
    throw new AppError("unsupported", `Photos must be JPEG, PNG or WebP. "${name}" is ${describeKind(kind)}, whatever its name says.`);
  }
  const facts = await examinePhoto(input.bytes);
  const store = blobStore();
  const storageKey = input.storageKey ?? newStorageKey("photos");
  await store.put(storageKey, facts.original, { contentType: mime });
  await store.put(thumbKeyOf(storageKey), facts.thumbnail, { contentType: THUMB_MIME });
  try {
    const [row] = await conn
      .insert(uploads)
      .values({
        id: newUploadId(), storageKey, originalName: name, mime, bytes: facts.original.byteLength, width: facts.width, height: facts.height,
        uploadedBy: input.uploadedBy, caseId: input.caseId ?? null, writeupId: input.writeupId ?? null,
      })
      .returning();
    return row;
  } catch (error) {
    if (!input.storageKey) await Promise.all([store.delete(storageKey), store.delete(thumbKeyOf(storageKey))]);
    throw error;
  }
}

/** The upload, if this user may see it: write-up photos follow the write-up, case photos the case. */
export async function findViewableUpload(id: string, user: SessionUser, conn: Db | Tx = db): Promise<Upload> {
  if (!UPLOAD_ID_PATTERN.test(id)) throw new AppError("not_found", "No such file.");
  const [row] = await conn
    .select({ upload: uploads, writeupStatus: writeups.status })
    .from(uploads)
    .leftJoin(writeups, eq(writeups.id, uploads.writeupId))
    .where(eq(uploads.id, id))
    .limit(1);
  if (!row) throw new AppError("not_found", "No such file.");
  const { upload, writeupStatus } = row;
  const allowed = writeupStatus
    ? mayReadWriteup(user.role, writeupStatus)
    : upload.caseId !== null
      ? may(user.role, "case:read")
      : upload.uploadedBy === user.id || mayUpload(user.role);
  if (!allowed) throw new AppError("forbidden", "Your role may not see this file.");
  return upload;
}

export async function readUploadBytes(upload: Upload, variant: "original" | "thumb"): Promise<{ bytes: Buffer; mime: string }> {
  const key = variant === "thumb" ? thumbKeyOf(upload.storageKey) : upload.storageKey;
  const bytes = await blobStore().get(key);
  if (!bytes) throw new AppError("not_found", "The file is missing from storage.");
  return { bytes, mime: variant === "thumb" ? THUMB_MIME : upload.mime };
}
