import { pgErrorCode } from "@/lib/errors";

/**
 * The SQLSTATE of a failed query. Drizzle wraps driver errors (DrizzleQueryError) and keeps the
 * PostgreSQL error as `cause`, so look there too.
 */
export function sqlState(error: unknown): string | undefined {
  return pgErrorCode(error) ?? (typeof error === "object" && error && "cause" in error ? pgErrorCode(error.cause) : undefined);
}
