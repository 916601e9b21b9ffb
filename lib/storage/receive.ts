import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { cases, writeups, type Upload } from "@/db/schema";
import { may } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";
import { AppError } from "@/lib/errors";
import { mayEditWriteup } from "@/lib/writeups/access";
import { mayUpload } from "./access";
import { MAX_UPLOAD_BYTES, MULTIPART_OVERHEAD_BYTES, readBodyLimited } from "./limits";
import { storePhoto } from "./uploads";

function optionalId(form: FormData, field: string): number | null {
  const value = form.get(field);
  if (value === null || value === "") return null;
  const n = typeof value === "string" && /^\d{1,9}$/.test(value) ? Number(value) : NaN;
  if (!Number.isSafeInteger(n) || n <= 0) throw new AppError("bad_request", `${field} must be a record number.`);
  return n;
}

async function assertMayLink(user: SessionUser, caseId: number | null, writeupId: number | null): Promise<void> {
  if (writeupId !== null) {
    const [w] = await db.select({ status: writeups.status, authorId: writeups.authorId }).from(writeups).where(eq(writeups.id, writeupId)).limit(1);
    if (!w) throw new AppError("not_found", "That write-up does not exist.");
    if (!mayEditWriteup(user, w)) throw new AppError("forbidden", "You may not add photos to that write-up.");
  }
  if (caseId !== null) {
    const [c] = await db.select({ reference: cases.reference, status: cases.status }).from(cases).where(eq(cases.id, caseId)).limit(1);
    if (!c) throw new AppError("not_found", "That case does not exist.");
    if (!may(user.role, "case:work")) throw new AppError("forbidden", "You may not add photos to cases.");
    if (c.status === "closed") {
      throw new AppError("conflict", `Case ${c.reference} is closed and its bench record is frozen; a senior mechanic can reopen it to add photos.`);
    }
  }
}

/**
 * POST /api/uploads: a multipart form with the photo in "file" and optionally caseId or writeupId.
 * The body is read with a hard cap, so an oversized upload is refused before anything is stored.
 */
export async function receivePhotoUpload(request: Request, user: SessionUser): Promise<Upload> {
  if (!mayUpload(user.role)) throw new AppError("forbidden", "Your role may not upload files.");
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data")) {
    throw new AppError("bad_request", "Send the photo as multipart/form-data in a field named \"file\".");
  }
  const body = await readBodyLimited(request, MAX_UPLOAD_BYTES + MULTIPART_OVERHEAD_BYTES);
  let form: FormData;
  try {
    form = await new Response(body, { headers: { "content-type": type } }).formData();
  } catch {
    throw new AppError("bad_request", "The upload could not be read as a form; try again.");
  }
  const file = form.get("file");
  if (!(file instanceof File)) throw new AppError("bad_request", "Send the photo in a form field named \"file\".");
  const caseId = optionalId(form, "caseId");
  const writeupId = optionalId(form, "writeupId");
  await assertMayLink(user, caseId, writeupId);
  return storePhoto({ bytes: new Uint8Array(await file.arrayBuffer()), originalName: file.name, uploadedBy: user.id, caseId, writeupId });
}
