import "server-only";
import type { SessionUser } from "@/lib/auth/session-user";
import { AppError } from "@/lib/errors";
import { checkImportFile, runImport } from "./import";
import { fileDigest, signImport, verifyImport } from "./import-token";
import type { UploadedCsv } from "./requests";
import type { RowProblem } from "./validate";

/** At most this many problems travel to the browser; the count says how many there are. */
const PROBLEMS_SHOWN = 500;

export interface ImportPreview {
  fileName: string;
  total: number;
  valid: number;
  skipped: number;
  problems: RowProblem[];
  problemCount: number;
  unusedColumns: string[];
  /** Signed claim the confirm must send back with the same file; null when nothing could be imported. */
  token: string | null;
}

export async function previewImport(upload: UploadedCsv, user: SessionUser): Promise<ImportPreview> {
  const check = await checkImportFile(upload.bytes);
  const valid = check.rows.length;
  return {
    fileName: upload.name, total: check.total, valid, skipped: check.skipped,
    problems: check.problems.slice(0, PROBLEMS_SHOWN), problemCount: check.problems.length, unusedColumns: check.unusedColumns,
    token: valid > 0 ? await signImport({ userId: user.id, sha256: fileDigest(upload.bytes), valid, skipped: check.skipped }) : null,
  };
}

/** The explicit confirmation: the same file, its preview token, and the counts the user agreed to. */
export async function confirmImport(upload: UploadedCsv, user: SessionUser) {
  const token = upload.form.get("token");
  const claim = typeof token === "string" ? await verifyImport(token) : "Check the file first; the import needs its preview.";
  if (typeof claim === "string") throw new AppError("bad_request", claim);
  if (claim.userId !== user.id) throw new AppError("bad_request", "This preview was made by someone else; check the file yourself first.");
  if (claim.sha256 !== fileDigest(upload.bytes)) throw new AppError("conflict", "The file differs from the one checked in the preview. Nothing was imported; check it again.");
  const valid = Number(upload.form.get("valid"));
  const skipped = Number(upload.form.get("skipped"));
  if (valid !== claim.valid || skipped !== claim.skipped) {
    throw new AppError("bad_request", `Confirm the import of ${claim.valid} valid rows, skipping ${claim.skipped}.`);
  }
  return runImport(upload.bytes, upload.name, user, { valid, skipped });
}
