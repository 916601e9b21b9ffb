import "server-only";
import { sql } from "@/db";
import { callerRow, type CallerCheck } from "@/lib/auth/caller-check";
import type { CaseContext } from "./context";
import { DIAGNOSIS_SETTINGS_KEY } from "./dx-settings";
import type { StoredRanking } from "./ranking-types";

export interface InsertedStep {
  id: number;
  seq: number;
  answeredAt: Date;
  /** The session's expiry, when the statement checked the caller itself. */
  sessionExpiresAt: Date | null;
}

/** Who answers: a user the caller already authorised, or a session the statement checks itself. */
export type StepAuthor = { userId: string } | { caller: CallerCheck };

/**
 * Appends a step in one statement, which is its own transaction. It locks the case row (for
 * update, without writing it: the step's answered_at is the latest activity) while the case is
 * still open and the shop's settings and the tree's likelihood mode are still those the ranking was
 * computed with (`basis`), and inserts only if the step the ranking was computed after is still
 * the last one (that row is share-locked, so an undo in between makes this insert nothing).
 * unique(case_id, seq) turns two racing answers into one success and one 23505.
 * With `by.caller`, the statement also finds the caller (callerRow: a live session of an active
 * user whose role may work cases) and records that user, so authorising and writing take one
 * round trip. Returns null when any guard fails. (Raw postgres.js here: drizzle's client leaves json and
 * timestamp parameters unserialised, hence the explicit JSON text and epoch milliseconds.)
 */
export async function appendStep(input: {
  caseId: number;
  previous: { id: number; seq: number } | null;
  nodeId: number;
  optionId: number;
  by: StepAuthor;
  ranking: StoredRanking;
  basis: CaseContext["basis"];
}): Promise<InsertedStep | null> {
  const seq = (input.previous?.seq ?? 0) + 1;
  const previousId = input.previous?.id ?? null;
  const author = "caller" in input.by
    ? callerRow(sql, input.by.caller)
    : sql`select ${input.by.userId}::text as user_id, null::timestamptz as expires_at`;
  const rows = await sql<{ id: number; seq: number; answered_ms: number; session_expires_ms: number | null }[]>`
    with author as (${author}), open_case as (
      select c.id from cases c
      where c.id = ${input.caseId} and c.status = 'open'
        and (select md5(value::text) from settings where key = ${DIAGNOSIS_SETTINGS_KEY}) is not distinct from ${input.basis.settingsHash}::text
        and (select t.likelihood_mode from tree_versions v join trees t on t.id = v.tree_id where v.id = c.tree_version_id) = ${input.basis.likelihoodMode}
      for update
    ), previous as (
      select id from case_steps where id = ${previousId} and case_id = ${input.caseId} for share
    )
    insert into case_steps (case_id, seq, node_id, option_id, answered_by, ranking)
    select open_case.id, ${seq}, ${input.nodeId}, ${input.optionId}, author.user_id, ${JSON.stringify(input.ranking)}::jsonb
    from open_case, author
    where (${previousId}::int is null and not exists (select 1 from case_steps where case_id = ${input.caseId}))
       or exists (select 1 from previous)
    returning id, seq, (extract(epoch from answered_at) * 1000)::float8 as answered_ms,
      (select (extract(epoch from expires_at) * 1000)::float8 from author) as session_expires_ms`;
  const row = rows[0];
  if (!row) return null;
  return {
    id: row.id,
    seq: row.seq,
    answeredAt: new Date(row.answered_ms),
    sessionExpiresAt: row.session_expires_ms === null ? null : new Date(row.session_expires_ms),
  };
}
