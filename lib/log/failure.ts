import { DrizzleQueryError } from "drizzle-orm/errors";

/**
 * Logs an unexpected failure without the data it carried. A failed query is logged by its SQL
 * text, SQLSTATE and constraint only: drizzle puts the bound parameters into its error message
 * and PostgreSQL quotes offending values in its own ("invalid input syntax for type integer:
 * "…""), so neither message is printed; customer contact data and password hashes stay out.
 */
export function logFailure(label: string, error: unknown): void {
  console.error(`${label}: ${describeFailure(error)}`);
}

interface DbErrorShape {
  query?: unknown;
  code?: unknown;
  constraint_name?: unknown;
  table_name?: unknown;
  column_name?: unknown;
  severity?: unknown;
}

function pgPart(error: DbErrorShape): string {
  const parts = [typeof error.code === "string" ? `SQLSTATE ${error.code}` : "database error"];
  if (typeof error.constraint_name === "string") parts.push(`constraint ${error.constraint_name}`);
  if (typeof error.table_name === "string") parts.push(`table ${error.table_name}`);
  if (typeof error.column_name === "string") parts.push(`column ${error.column_name}`);
  return parts.join(", ");
}

const isPgError = (e: unknown): e is Error & DbErrorShape =>
  e instanceof Error && (e.name === "PostgresError" || ("severity" in e && "code" in e));

/** One line (plus the stack of where it was thrown) that never repeats a query's parameters. */
export function describeFailure(error: unknown): string {
  if (error instanceof DrizzleQueryError) {
    const cause = error.cause;
    const reason = isPgError(cause) ? pgPart(cause) : cause instanceof Error ? cause.name : "unknown cause";
    return `query failed (${reason}): ${error.query}`;
  }
  if (isPgError(error)) {
    const query = (error as { query?: unknown }).query; // postgres.js sets it, not enumerable
    return `query failed (${pgPart(error)})${typeof query === "string" ? `: ${query}` : ""}`;
  }
  if (error instanceof Error) return `${error.name}: ${error.message}\n${(error.stack ?? "").split("\n").slice(1, 6).join("\n")}`;
  return String(error);
}
