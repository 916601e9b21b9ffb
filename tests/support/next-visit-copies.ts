import { sql } from "drizzle-orm";
import { db } from "@/db";

/**
 * The case rows whose copy of the unit's next visit (next_visit_at, next_visit_cause_ids) differs
 * from a from-scratch recomputation: the next case of the same motor family and serial by
 * (created_at, id), none without a serial.
 */
export async function casesWithStaleNextVisit(): Promise<{ id: number; stored: string | null; expected: string | null }[]> {
  const rows = await db.execute<{ id: number; stored: string | null; expected: string | null }>(sql`
    with expected as (
      select id, lead(created_at) over w as next_at, lead(confirmed_cause_ids) over w as next_causes
      from cases where serial <> ''
      window w as (partition by family_id, serial order by created_at, id)
    )
    select c.id, c.next_visit_at::text || ' ' || coalesce(c.next_visit_cause_ids::text, '-') as stored,
           e.next_at::text || ' ' || coalesce(e.next_causes::text, '-') as expected
    from cases c left join expected e on e.id = c.id
    where (c.next_visit_at, c.next_visit_cause_ids) is distinct from (e.next_at, e.next_causes)
    order by c.id`);
  return [...rows];
}
