import "server-only";
import { sql } from "drizzle-orm";
import type { Tx } from "@/db";

/**
 * Copies the confirmed causes of these cases' bench outcomes onto the case rows (the primary one and
 * all of them, by id), where return-free follow-up reads a unit's visits in one index scan. Every
 * writer of outcome_causes calls it in the same transaction, after the case row lock where there is
 * one, so the copy never disagrees with the outcome. It holds only the case's own data: a cause's
 * area or group is still read from the catalogue, so editing the catalogue leaves nothing stale.
 */
export async function storeConfirmedCauses(tx: Tx, caseIds: number[]): Promise<void> {
  if (caseIds.length === 0) return;
  await tx.execute(sql`
    update cases c set
      primary_cause_id = (select oc.cause_id from outcome_causes oc where oc.case_id = c.id and oc.is_primary),
      confirmed_cause_ids = coalesce((select array_agg(oc.cause_id order by oc.cause_id) from outcome_causes oc where oc.case_id = c.id), '{}')
    where c.id = any(${`{${caseIds.join(",")}}`}::int[])`);
}
