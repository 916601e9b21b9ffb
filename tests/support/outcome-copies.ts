import { sql } from "drizzle-orm";
import { db } from "@/db";

/** The case rows whose copies (causes, upgrades, parts) disagree with their own bench outcome's rows. */
export async function casesDisagreeingWithOutcome(): Promise<number[]> {
  const rows = await db.execute<{ id: number }>(sql`
    select c.id from cases c
    where c.primary_cause_id is distinct from (select oc.cause_id from outcome_causes oc where oc.case_id = c.id and oc.is_primary)
       or c.confirmed_cause_ids <> coalesce((select array_agg(oc.cause_id order by oc.cause_id) from outcome_causes oc where oc.case_id = c.id), '{}')
       or c.fitted_upgrades <> coalesce((select array_agg(u.upgrade order by u.upgrade) from outcome_upgrades u where u.case_id = c.id), '{}')
       or c.part_ids <> coalesce((select array_agg(p.part_id order by p.part_id) from outcome_parts p where p.case_id = c.id), '{}')
       or c.part_quantities <> coalesce((select array_agg(p.quantity order by p.part_id) from outcome_parts p where p.case_id = c.id), '{}')
    order by c.id`);
  return rows.map((r) => r.id);
}
