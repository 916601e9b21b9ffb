import "server-only";
import { cookies } from "next/headers";
import type { z } from "zod";
import { SESSION_COOKIE } from "@/lib/auth/lucia";
import { currentSession, currentUser } from "@/lib/auth/session";
import { executeAction, type ActionResult, type ActionSpec } from "./define";
import { tryInOneTrip } from "./one-trip";

/**
 * What every server action calls: the caller comes from the session cookie of this request.
 * An action with `inOneTrip` first tries that, where the write checks the session and role itself.
 */
export async function runAction<S extends z.ZodType, R>(
  spec: ActionSpec<S, R>,
  raw: FormData | Record<string, unknown>,
): Promise<ActionResult<R>> {
  if (spec.inOneTrip) {
    const quick = await tryInOneTrip(spec, raw, (await cookies()).get(SESSION_COOKIE)?.value);
    if (quick) {
      if (quick.extendSession) await currentSession(); // lucia moves the expiry on and the cookie follows
      return quick.result;
    }
  }
  return executeAction(spec, raw, await currentUser());
}
