import { NextResponse } from "next/server";
import { previewImport } from "@/lib/csv/preview";
import { readCsvUpload } from "@/lib/csv/requests";
import { route } from "@/lib/http/route";

// POST /api/imports/preview (multipart "file"): checks a past-repairs CSV; writes nothing.
export const POST = route("reports:import", async (request, { user }) => {
  return NextResponse.json(await previewImport(await readCsvUpload(request), user));
});
