import "server-only";
import type { z } from "zod";
import { callerCheck, sessionWantsExtending } from "@/lib/auth/caller-check";
import type { Capability } from "@/lib/auth/roles";
import type { ActionSpec, ActionSuccess } from "./define";
import { formDataToObject } from "./form-data";
import { logFailure } from "@/lib/log/failure";

export interface OneTripOutcome<R> {
  result: ActionSuccess<R>;
  /** The session is past half its lifetime: the caller should extend it (and its cookie) as lucia would. */
  extendSession: boolean;
}

/**
 * Runs an action's `inOneTrip` for the session token of the request. Null when the action has
 * none, or it did not complete (whatever the reason): the caller then runs the ordinary path,
 * which gives the same 401/403/400/404/409 an unlucky caller would have got without this.
 */
export async function tryInOneTrip<S extends z.ZodType, R>(
  spec: ActionSpec<S, R>,
  raw: FormData | Record<string, unknown>,
  token: string | undefined | null,
): Promise<OneTripOutcome<R> | null> {
  if (!spec.inOneTrip || spec.access === "public") return null;
  const check = callerCheck(token, spec.access as Capability);
  if (!check) return null;
  const parsed = spec.input.safeParse(raw instanceof FormData ? formDataToObject(raw) : raw);
  if (!parsed.success) return null;
  let done;
  try {
    done = await spec.inOneTrip(parsed.data, check);
  } catch (error) {
    // Nothing was written; the ordinary path runs the same work again and answers the caller.
    logFailure(`action ${spec.name}: the one-trip path failed, using the ordinary one`, error);
    return null;
  }
  if (!done) return null;
  return { result: { ok: true, data: done.value }, extendSession: sessionWantsExtending(done.sessionExpiresAt) };
}
