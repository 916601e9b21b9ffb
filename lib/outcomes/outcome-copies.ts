import "server-only";
import { sql } from "drizzle-orm";
import type { Tx } from "@/db";

/**
 * Copies these cases' bench outcomes onto the case rows: the confirmed causes (the primary one and all
 * of them, by id) and the upgrades fitted, where return-free follow-up reads the repairs in one
 * index scan (the trigger on cases copies the confirmed causes to the unit's visit before, as its
 * next visit's), and the parts replaced (ids and quantities, ordered by part id), where parts demand
 * reads closed cases in one index scan. Every writer of outcome_causes, outcome_upgrades or
 * outcome_parts calls it in the same transaction, after those writes and after the case row lock
 * where there is one, so the copy never disagrees with the outcome. It holds only the case's own
 * data: a cause's area or group is still read from the catalogue, so editing the catalogue leaves
 * nothing stale.
 */
export async function storeOutcomeCopies(tx: Tx, caseIds: number[]): Promise<void> {
  if (caseIds.length === 0) return;
  await tx.execute(sql`
    update cases c set
      primary_cause_id = (select oc.cause_id from outcome_causes oc where oc.case_id = c.id and oc.is_primary),
      confirmed_cause_ids = coalesce((select array_agg(oc.cause_id order by oc.cause_id) from outcome_causes oc where oc.case_id = c.id), '{}'),
      fitted_upgrades = coalesce((select array_agg(u.upgrade order by u.upgrade) from outcome_upgrades u where u.case_id = c.id), '{}'),
      (part_ids, part_quantities) = (
        select coalesce(array_agg(p.part_id order by p.part_id), '{}'), coalesce(array_agg(p.quantity order by p.part_id), '{}')
        from outcome_parts p where p.case_id = c.id)
    where c.id = any(${`{${caseIds.join(",")}}`}::int[])`);
}
