import "server-only";
import type { TransactionSql } from "postgres";
import { sql as pg } from "@/db";
import { RIDING_USES } from "@/db/schema";
import { CAUSE_GROUPS } from "./groups";
import { UPGRADES } from "./upgrades";

export type RidingUse = (typeof RIDING_USES)[number];

/** Which repairs are followed: closed in [from, to), optionally of one motor family and riding use. */
export interface FollowUpScope {
  from: Date;
  to: Date;
  familyId: number | null;
  ridingUse: RidingUse | null;
  /** Follow-up of units not back ends here (normally now). */
  asOf: Date;
}

/**
 * Follow-ups counted together: `key` is a cause group for all repairs of that group, or an upgrade
 * slug for the repairs of the group it guards that had it fitted.
 */
export interface FollowUpCount {
  kind: "group" | "fitted";
  key: string;
  days: number;
  event: boolean;
  n: number;
}

/** The cause group of a causes.area column, in SQL (the areas are our own fixed list, so inlining them is safe). */
function groupOf(column: string) {
  const whens = CAUSE_GROUPS.map((g) => `when ${column} in (${g.areas.map((a) => `'${a}'`).join(", ")}) then '${g.slug}'`);
  return pg.unsafe(`(case ${whens.join(" ")} else 'other' end)`);
}

/**
 * The upgrades as SQL rows: slug, the group it guards and its place in `fittedCounts` (our own fixed
 * list, so inlining them is safe).
 */
const upgradeRows = pg.unsafe(`(values ${UPGRADES.map((u, i) => `('${u.slug}', '${u.guards}', ${i + 1})`).join(", ")}) as u(upgrade, guards, i)`);

/**
 * For each upgrade, in the order of UPGRADES, how many of the grouped repairs of the group it guards had it fitted
 * (from the case row's copy); 0 in other groups. The group is tested first, so each repair's upgrades
 * are only searched for the few upgrades that guard its group.
 */
function fittedCounts(upgrades: string, group: string) {
  return pg.unsafe(`array[${UPGRADES.map((u) => `count(*) filter (where ${group} = '${u.guards}' and '${u.slug}' = any(${upgrades}))`).join(", ")}]::int[]`);
}

/**
 * How long each repair in scope lasted, in whole days from its closing:
 * - a repair is a closed case with a serial and a primary confirmed cause from the catalogue;
 * - its follow-up ends at the unit's next visit: the next case of the same motor family and serial,
 *   by opening time. That visit is an event when its bench outcome confirms any cause in the same
 *   cause group as the repair's primary cause; a visit for an unrelated fault, or one with no cause
 *   confirmed yet, ends the follow-up censored at the visit;
 * - a unit not back is censored at `asOf`. A visit opened before the repair was closed (a second
 *   booking for a unit still on the bench) is not a return: censored at day 0.
 * Reopening a case moves its closing (the follow-up starts at the last closing); a serial back
 * twice gives two follow-ups, each ended by the visit after it. Counted in Postgres, grouped.
 */
export function followUpQuery(scope: FollowUpScope, db: TransactionSql | typeof pg = pg) {
  const family = scope.familyId === null ? pg`` : pg`and r.family_id = ${scope.familyId}`;
  const use = scope.ridingUse === null ? pg`` : pg`and r.riding_use = ${scope.ridingUse}`;
  // Each case row carries copies of its confirmed causes and upgrades fitted (primary_cause_id,
  // fitted_upgrades) and of the unit's next visit (next_visit_at, next_visit_cause_ids), so the
  // repairs in scope are read alone, with no walk over the unit's other visits; each cause's group
  // still comes from the catalogue. One pass counts the repairs by group, days and event, with how
  // many had each upgrade fitted; an upgrade's counts are those of the group it guards.
  return db<FollowUpCount[]>`
    with cause_groups as materialized (
      select id, grp, array_agg(id) over (partition by grp) as group_ids
      from (select id, ${groupOf("area")} as grp from causes) g
    ),
    tally as (
      select g.grp,
             -- A difference of two timestamptz is whole days plus under 24 hours, so its day field is the
             -- whole days elapsed (and cheaper than dividing its epoch in numeric).
             extract(day from case when r.next_visit_at is null then ${scope.asOf.toISOString()}::timestamptz - r.closed_at
                                   else greatest(r.next_visit_at - r.closed_at, interval '0') end)::int as days,
             coalesce(r.next_visit_at > r.closed_at and r.next_visit_cause_ids && g.group_ids, false) as event,
             count(*)::int as n, ${fittedCounts("r.fitted_upgrades", "g.grp")} as fitted
      from cases r join cause_groups g on g.id = r.primary_cause_id
      where r.status = 'closed' and r.serial <> '' and r.closed_at >= ${scope.from.toISOString()}::timestamptz
        and r.closed_at < ${scope.to.toISOString()}::timestamptz ${family} ${use}
      group by 1, 2, 3
    )
    select 'group' as kind, grp as key, days, event, n from tally
    union all
    select 'fitted', u.upgrade, t.days, t.event, t.fitted[u.i]
    from tally t join ${upgradeRows} on u.guards = t.grp
    where t.fitted[u.i] > 0`;
}

/**
 * The follow-up counts in scope. The tally groups every repair by day; the planner cannot tell how
 * few (group, day, event) groups there are and, with the default 4 MB of working memory, sorts
 * 100,000 rows on disk instead of hashing them. This one query gets more, for its own transaction.
 */
export async function followUps(scope: FollowUpScope): Promise<FollowUpCount[]> {
  return pg.begin(async (tx) => {
    await tx`set local work_mem = '32MB'`;
    return followUpQuery(scope, tx);
  });
}
