import "server-only";
import { AppError, isAppError } from "@/lib/errors";
import { readBodyLimited } from "@/lib/storage/limits";
import { IMPORT_MAX_BYTES } from "./import";

export interface UploadedCsv {
  bytes: Uint8Array;
  name: string;
  form: FormData;
}

/** The CSV from a multipart request (field "file"), its body read with a hard cap. */
export async function readCsvUpload(request: Request): Promise<UploadedCsv> {
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data")) throw new AppError("bad_request", "Send the CSV as multipart/form-data in a field named \"file\".");
  const body = await readBodyLimited(request, IMPORT_MAX_BYTES + 64 * 1024).catch((error: unknown) => {
    if (isAppError(error) && error.code === "too_large") throw new AppError("too_large", "The file is larger than 2 MB; split it and import the parts one after the other.");
    throw error;
  });
  let form: FormData;
  try {
    form = await new Response(body, { headers: { "content-type": type } }).formData();
  } catch {
    throw new AppError("bad_request", "The upload could not be read as a form; try again.");
  }
  const file = form.get("file");
  if (!(file instanceof File)) throw new AppError("bad_request", "Choose a CSV file first.");
  return { bytes: new Uint8Array(await file.arrayBuffer()), name: file.name || "upload.csv", form };
}
