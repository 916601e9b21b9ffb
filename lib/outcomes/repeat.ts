import "server-only";
import { sql } from "drizzle-orm";
import { db, type Db, type Tx } from "@/db";

/** A unit back with the same serial within this many days of an earlier case of its family is a repeat return. */
export const REPEAT_WINDOW_DAYS = 90;

export interface RepeatLink {
  id: number;
  reference: string;
  status: string;
  createdAt: string;
  /** Whole days between the two cases' creation; negative when the other case came first. */
  days: number;
  direction: "earlier" | "later";
}

/**
 * The most recent earlier case of the same motor family and serial created within the window
 * before this one, or null. An empty serial never matches.
 */
export async function earlierVisitOf(conn: Db | Tx, caseId: number): Promise<number | null> {
  const rows = await conn.execute<{ id: number }>(sql`
    select e.id
    from cases c
    join cases e on e.family_id = c.family_id and e.serial = c.serial and e.id <> c.id
    where c.id = ${caseId}
      and c.serial <> ''
      and e.created_at < c.created_at
      and e.created_at >= c.created_at - make_interval(days => ${REPEAT_WINDOW_DAYS})
    order by e.created_at desc
    limit 1`);
  return rows[0]?.id ?? null;
}

/** Sets cases.repeat_of_case_id from the serial match (clearing it when the serial no longer matches). */
export async function refreshRepeatLink(tx: Tx, caseId: number): Promise<number | null> {
  const earlier = await earlierVisitOf(tx, caseId);
  await tx.execute(sql`update cases set repeat_of_case_id = ${earlier} where id = ${caseId} and repeat_of_case_id is distinct from ${earlier}`);
  return earlier;
}

/**
 * Both directions for the case page: earlier visits this case repeats and later visits that
 * repeat it, by the serial window, plus the stored link of this case (kept even if a serial was corrected).
 */
export async function repeatLinksOf(caseId: number, conn: Db | Tx = db): Promise<RepeatLink[]> {
  const rows = await conn.execute<{ id: number; reference: string; status: string; created_at: string; days: number }>(sql`
    with c as (select id, family_id, serial, created_at, repeat_of_case_id from cases where id = ${caseId}),
    matched as (
      select o.id from cases o, c
      where c.serial <> '' and o.serial = c.serial and o.family_id = c.family_id and o.id <> c.id
        and o.created_at between c.created_at - make_interval(days => ${REPEAT_WINDOW_DAYS})
                             and c.created_at + make_interval(days => ${REPEAT_WINDOW_DAYS})
      union
      select c.repeat_of_case_id from c where c.repeat_of_case_id is not null
    )
    select o.id, o.reference, o.status, o.created_at,
           floor(extract(epoch from o.created_at - c.created_at) / 86400)::int as days
    from matched m join cases o on o.id = m.id, c
    order by o.created_at`);
  return rows.map((r) => ({
    id: r.id, reference: r.reference, status: r.status, createdAt: r.created_at, days: r.days,
    direction: r.days < 0 ? "earlier" : "later",
  }));
}
