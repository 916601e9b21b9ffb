import { NextResponse } from "next/server";
import { executeAction } from "@/lib/actions/define";
import { answerStepAction } from "@/lib/triage/answer";
import { jsonError, route } from "@/lib/http/route";

/**
 * Records one answer: POST /api/cases/:id/steps { nodeId, optionId } (database ids). The same
 * action the triage screen uses, for clients without React (scripts, a headset integration).
 */
export const POST = route<{ id: string }>("case:work", async (request, { user, params }) => {
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    return jsonError(400, "The body must be JSON: { nodeId, optionId }.");
  }
  if (!body || typeof body !== "object" || Array.isArray(body)) return jsonError(400, "The body must be a JSON object: { nodeId, optionId }.");
  const result = await executeAction(answerStepAction, { ...body, caseId: params.id }, user);
  if (!result.ok) return jsonError(result.status, result.error, result.fieldErrors ? { fieldErrors: result.fieldErrors } : {});
  return NextResponse.json(result.data, { status: 201 });
});
