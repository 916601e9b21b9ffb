import "server-only";
import { sql } from "drizzle-orm";
import type { Tx } from "@/db";

/** "WD-2611-0042": shop letters, year and month (UTC), then a sequence within that month. */
export function formatReference(code: string, at: Date, seq: number): string {
  const yy = String(at.getUTCFullYear() % 100).padStart(2, "0");
  const mm = String(at.getUTCMonth() + 1).padStart(2, "0");
  return `${code}-${yy}${mm}-${String(seq).padStart(4, "0")}`;
}

/**
 * The next free reference, inside the caller's transaction. A transaction-scoped advisory lock
 * serialises concurrent case starts until commit; the unique index on cases.reference backs it up.
 */
export async function nextReference(tx: Tx, code: string, at: Date): Promise<string> {
  const prefix = formatReference(code, at, 0).slice(0, -4);
  await tx.execute(sql`select pg_advisory_xact_lock(hashtext('rootbench.case-reference'))`);
  const pattern = `^${prefix}([0-9]+)$`;
  const [row] = await tx.execute<{ last: number | null }>(
    sql`select max((substring(reference from ${pattern}))::int) as last from cases where reference like ${prefix + "%"}`,
  );
  return formatReference(code, at, (row?.last ?? 0) + 1);
}
