import { NextResponse } from "next/server";
import { confirmImport } from "@/lib/csv/preview";
import { readCsvUpload } from "@/lib/csv/requests";
import { route } from "@/lib/http/route";

// POST /api/imports (multipart "file", "token", "valid", "skipped"): imports the confirmed rows in one transaction.
export const POST = route("reports:import", async (request, { user }) => {
  const result = await confirmImport(await readCsvUpload(request), user);
  return NextResponse.json({ imported: result.imported, skipped: result.skipped }, { status: 201 });
});
