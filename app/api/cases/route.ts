import { NextResponse } from "next/server";
import { jsonError, route } from "@/lib/http/route";
import { listCases } from "@/lib/cases/list";
import { caseListQuery } from "@/lib/cases/list-query";

/** One page of the case table: GET /api/cases?status=&family=&symptom=&technician=&from=&to=&q=&sort=&dir=&page=&limit= */
export const GET = route("case:read", async (request) => {
  const parsed = caseListQuery.safeParse(Object.fromEntries(request.nextUrl.searchParams));
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return jsonError(400, `${issue.path.join(".") || "query"}: ${issue.message}`);
  }
  return NextResponse.json(await listCases(parsed.data), { headers: { "cache-control": "no-store" } });
});
