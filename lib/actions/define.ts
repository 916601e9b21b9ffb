import { z } from "zod";
import { authorize, type Access } from "@/lib/auth/authorize";
import type { SessionUser } from "@/lib/auth/session-user";
import { AppError, isAppError } from "@/lib/errors";
import { formDataToObject, echoFields } from "./form-data";
import { logFailure } from "@/lib/log/failure";
import { CONTROL_CHARACTER_MESSAGE, fieldWithControlCharacter } from "@/lib/http/control-characters";

export type ActionFailure = {
  ok: false;
  status: number;
  error: string;
  fieldErrors?: Record<string, string>;
  fields?: Record<string, string>;
};
export type ActionSuccess<R> = { ok: true; data: R; message?: string };
export type ActionResult<R> = ActionSuccess<R> | ActionFailure;
/** What a form's useActionState holds: nothing yet, or the last result. */
export type ActionState<R> = ActionResult<R> | null;

export interface ActionContext {
  user: SessionUser;
}

export interface ActionSpec<S extends z.ZodType, R> {
  /** Stable name, used by the role matrix test. */
  name: string;
  access: Access;
  input: S;
  run: (input: z.output<S>, ctx: ActionContext) => Promise<R | ActionSuccess<R>>;
}

export function defineAction<S extends z.ZodType, R>(spec: ActionSpec<S, R>): ActionSpec<S, R> {
  return spec;
}

function fieldErrorsOf(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_form";
    out[key] ??= issue.message;
  }
  return out;
}

/**
 * Runs an action for a known caller: role check first (401/403), then input validation (400),
 * then the work. Typed AppErrors become their status; anything else is logged, never leaked.
 */
export async function executeAction<S extends z.ZodType, R>(
  spec: ActionSpec<S, R>,
  raw: FormData | Record<string, unknown>,
  user: SessionUser | null,
): Promise<ActionResult<R>> {
  const fields = raw instanceof FormData ? echoFields(raw) : undefined;
  const verdict = authorize(user, spec.access);
  if (verdict === 401) return { ok: false, status: 401, error: "Please sign in again." };
  if (verdict === 403) return { ok: false, status: 403, error: "Your role may not do this." };

  const plain = raw instanceof FormData ? formDataToObject(raw) : raw;
  const controlled = fieldWithControlCharacter(plain);
  if (controlled) {
    return { ok: false, status: 400, error: CONTROL_CHARACTER_MESSAGE, fieldErrors: { [controlled]: CONTROL_CHARACTER_MESSAGE }, fields };
  }
  const parsed = spec.input.safeParse(plain);
  if (!parsed.success) {
    const fieldErrors = fieldErrorsOf(parsed.error);
    return { ok: false, status: 400, error: "Please correct the highlighted fields.", fieldErrors, fields };
  }
  try {
    const ctxUser = user ?? { id: "", email: "", name: "", role: "trainee" as const };
    const value = await spec.run(parsed.data, { user: ctxUser });
    if (value && typeof value === "object" && "ok" in value && value.ok === true) return value as ActionSuccess<R>;
    return { ok: true, data: value as R };
  } catch (error) {
    if (isAppError(error)) {
      return { ok: false, status: error.status, error: error.message, fieldErrors: error.fieldErrors, fields };
    }
    if (isNextControlFlow(error)) throw error;
    logFailure(`action ${spec.name} failed`, error);
    return { ok: false, status: 500, error: "Something went wrong on the server; nothing was saved.", fields };
  }
}

// redirect(), notFound() and friends throw special errors that Next must see.
function isNextControlFlow(error: unknown): boolean {
  return typeof error === "object" && error !== null && "digest" in error &&
    typeof (error as { digest: unknown }).digest === "string" &&
    /^(NEXT_|NEXT_HTTP_ERROR_FALLBACK)/.test((error as { digest: string }).digest);
}

export function fail(code: ConstructorParameters<typeof AppError>[0], message: string, fieldErrors?: Record<string, string>): never {
  throw new AppError(code, message, { fieldErrors });
}
