import "server-only";
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

/** The cause group an upgrade guards, in SQL (the slugs are our own fixed list, so inlining them is safe). */
function guardOf(column: string) {
  return pg.unsafe(`(case ${column} ${UPGRADES.map((u) => `when '${u.slug}' then '${u.guards}'`).join(" ")} end)`);
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
export function followUpQuery(scope: FollowUpScope) {
  const use = scope.ridingUse === null ? pg`` : pg`and r.riding_use = ${scope.ridingUse}`;
  const visitFamily = scope.familyId === null ? pg`` : pg`and c.family_id = ${scope.familyId}`;
  return pg<FollowUpCount[]>`
    with visits as (
      select c.id, c.status, c.closed_at, c.riding_use,
             lead(c.id) over w as next_id, lead(c.created_at) over w as next_at
      from cases c
      where c.serial <> '' ${visitFamily}
      window w as (partition by c.family_id, c.serial order by c.created_at, c.id)
    ),
    repairs as materialized (
      select r.id, r.next_id, r.next_at > r.closed_at as came_back, ${groupOf("ca.area")} as grp,
             floor(extract(epoch from case when r.next_id is null then ${scope.asOf.toISOString()}::timestamptz - r.closed_at
                                           else greatest(r.next_at - r.closed_at, interval '0') end) / 86400)::int as days
      from visits r
      join outcome_causes oc on oc.case_id = r.id and oc.is_primary
      join causes ca on ca.id = oc.cause_id
      where r.status = 'closed' and r.closed_at >= ${scope.from.toISOString()}::timestamptz
        and r.closed_at < ${scope.to.toISOString()}::timestamptz ${use}
    ),
    -- The groups confirmed at each unit's next visit, for the repairs whose unit came back.
    confirmed_next as (
      select distinct x.case_id, ${groupOf("y.area")} as grp
      from outcome_causes x join causes y on y.id = x.cause_id
      where x.case_id in (select next_id from repairs where came_back)
    ),
    ended as (
      select r.id, r.grp, r.days, cn.case_id is not null as event
      from repairs r left join confirmed_next cn on cn.case_id = r.next_id and cn.grp = r.grp and r.came_back
    )
    select 'group' as kind, grp as key, days, event, count(*)::int as n from ended group by grp, days, event
    union all
    select 'fitted', u.upgrade, r.days, r.event, count(*)::int
    from ended r join outcome_upgrades u on u.case_id = r.id
    where ${guardOf("u.upgrade")} = r.grp
    group by u.upgrade, r.days, r.event`;
}

export async function followUps(scope: FollowUpScope): Promise<FollowUpCount[]> {
  return followUpQuery(scope);
}
