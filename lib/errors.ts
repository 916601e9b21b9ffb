/** Typed errors the app raises on purpose; anything else is logged and shown as a generic failure. */
export const ERROR_STATUS = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  too_large: 413,
  unsupported: 415,
  invalid: 422,
  too_many: 429,
  unavailable: 503,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

export class AppError extends Error {
  readonly code: ErrorCode;
  readonly fieldErrors?: Record<string, string>;
  readonly details?: unknown;

  constructor(code: ErrorCode, message: string, options: { fieldErrors?: Record<string, string>; details?: unknown } = {}) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.fieldErrors = options.fieldErrors;
    this.details = options.details;
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }
}

export function isAppError(error: unknown): error is AppError {
  return error instanceof AppError;
}

/** PostgreSQL SQLSTATE of a driver error, if it is one. */
export function pgErrorCode(error: unknown): string | undefined {
  if (typeof error === "object" && error && "code" in error && typeof error.code === "string") return error.code;
  return undefined;
}
