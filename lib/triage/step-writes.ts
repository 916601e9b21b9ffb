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
 * `basis` (the settings it was worked out with), in one round trip: `rootbench_append_case_step`
 * (migration 0016) locks the case row first (for update, without writing it), the lock order of
 * undo and finish, and holding it inserts the step only if the case is still open, the shop's
 * settings and the tree's likelihood setting are unchanged and `previous` is still the last step.
 * Its insert is a statement of its own, so it sees an answer or undo that committed while the lock
 * was awaited. Returns null when a guard refused the step. unique(case_id, seq) is the last line:
 * two racing inserts can never both land at one seq.
 * (Raw postgres.js: drizzle's client leaves json parameters unserialised, hence the explicit JSON text.)
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
  const [row] = await sql<{ step_id: number; step_seq: number; answered_ms: number }[]>`
    select step_id, step_seq, answered_ms from rootbench_append_case_step(
      ${input.caseId}::int, ${input.previous?.id ?? null}::int, ${(input.previous?.seq ?? 0) + 1}::int, ${input.nodeId}::int,
      ${input.optionId}::int, ${input.userId}::text, ${JSON.stringify(input.ranking)}::jsonb, ${DIAGNOSIS_SETTINGS_KEY}::text,
      ${input.basis.settingsHash}::text, ${input.basis.likelihoodMode}::text)`;
  return row ? { id: row.step_id, seq: row.step_seq, answeredAt: new Date(row.answered_ms) } : null;
}
