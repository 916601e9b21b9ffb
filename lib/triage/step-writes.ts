import "server-only";
import { sql } from "@/db";
import type { CaseContext } from "./context";
import { DIAGNOSIS_SETTINGS_KEY } from "./dx-settings";
import type { StoredRanking } from "./ranking-types";

export interface InsertedStep {
  id: number;
  seq: number;
  answeredAt: Date;
}

/**
 * Appends a step computed from `previous` (the last step the ranking was worked out after) and
 * `basis` (the settings it was worked out with). Lock order, as for undo and finish: the case row
 * first (for update, without writing it). Holding it, the insert happens only if the case is still
 * open, the shop's settings and the tree's likelihood setting are unchanged and `previous` is still
 * the last step; each statement of the transaction sees what committed before it ran, so an answer
 * or undo that got in first is seen. Returns null when a guard refused the step.
 * unique(case_id, seq) is the last line: two racing inserts can never both land at one seq.
 * (Raw postgres.js: drizzle's client leaves json and timestamp parameters unserialised, hence the
 * explicit JSON text and epoch milliseconds.)
 */
export async function appendStep(input: {
  caseId: number;
  previous: { id: number; seq: number } | null;
  nodeId: number;
  optionId: number;
  userId: string;
  ranking: StoredRanking;
  basis: CaseContext["basis"];
}): Promise<InsertedStep | null> {
  const seq = (input.previous?.seq ?? 0) + 1;
  const previousId = input.previous?.id ?? null;
  return sql.begin(async (tx) => {
    const locked = await tx`
      select c.id from cases c
      where c.id = ${input.caseId} and c.status = 'open'
        and (select md5(value::text) from settings where key = ${DIAGNOSIS_SETTINGS_KEY}) is not distinct from ${input.basis.settingsHash}::text
        and (select t.likelihood_mode from tree_versions v join trees t on t.id = v.tree_id where v.id = c.tree_version_id) = ${input.basis.likelihoodMode}
      for update of c`;
    if (!locked.length) return null;
    const rows = await tx<{ id: number; seq: number; answered_ms: number }[]>`
      insert into case_steps (case_id, seq, node_id, option_id, answered_by, ranking)
      select ${input.caseId}, ${seq}, ${input.nodeId}, ${input.optionId}, ${input.userId}, ${JSON.stringify(input.ranking)}::jsonb
      where (select id from case_steps where case_id = ${input.caseId} order by seq desc limit 1) is not distinct from ${previousId}::int
      returning id, seq, (extract(epoch from answered_at) * 1000)::float8 as answered_ms`;
    const row = rows[0];
    return row ? { id: row.id, seq: row.seq, answeredAt: new Date(row.answered_ms) } : null;
  });
}
