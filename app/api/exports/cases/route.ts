import { casesCsvStream, exportFileName } from "@/lib/csv/export";
import { route } from "@/lib/http/route";
import { parseReportFilter } from "@/lib/reports/period";
import { resolveScope } from "@/lib/reports/scope";

// GET /api/exports/cases?last=12&family=slug (or from/to): closed cases with outcomes as CSV.
export const GET = route("reports:export", async (request) => {
  const scope = await resolveScope(parseReportFilter(request.nextUrl.searchParams));
  return new Response(casesCsvStream(scope), {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${exportFileName(scope)}"`,
      "cache-control": "no-store",
    },
  });
});
