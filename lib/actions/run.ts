import "server-only";
import type { z } from "zod";
import { currentUser } from "@/lib/auth/session";
import { executeAction, type ActionResult, type ActionSpec } from "./define";

/** What every server action calls: the caller comes from the session cookie of this request. */
export async function runAction<S extends z.ZodType, R>(
  spec: ActionSpec<S, R>,
  raw: FormData | Record<string, unknown>,
): Promise<ActionResult<R>> {
  return executeAction(spec, raw, await currentUser());
}
