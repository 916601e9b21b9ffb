import "server-only";
import { sql } from "drizzle-orm";
import { db, type Db, type Tx } from "@/db";
import { weightTable, type ClosedCase, type WeightTable } from "@/lib/diagnosis";
import { DIAGNOSIS_SETTINGS_KEY, parseDiagnosisSettings } from "@/lib/triage/dx-settings";

/**
 * The closed cases walked on one tree version, as the engine learns from them: the answers in
 * step order (node and option keys) and the primary confirmed catalogue cause. Cases without steps
 * (imported records) and "other" outcomes say nothing about the tree's causes and are left out.
 */
export async function closedCasesOf(versionId: number, conn: Db | Tx = db): Promise<ClosedCase[]> {
  const rows = await conn.execute<{ caseId: number; node: string; option: string; cause: string }>(sql`
    select s.case_id as "caseId", n.key as node, o.key as option, ca.slug as cause
    from cases c
    join outcome_causes oc on oc.case_id = c.id and oc.is_primary
    join causes ca on ca.id = oc.cause_id
    join case_steps s on s.case_id = c.id
    join tree_nodes n on n.id = s.node_id
    join tree_options o on o.id = s.option_id
    where c.tree_version_id = ${versionId} and c.status = 'closed'
    order by s.case_id, s.seq`);
  const out: ClosedCase[] = [];
  let current: { id: number; c: ClosedCase } | null = null;
  for (const r of rows) {
    if (!current || current.id !== r.caseId) {
      current = { id: r.caseId, c: { answers: [], confirmedCauseId: r.cause } };
      out.push(current.c);
    }
    current.c.answers.push({ nodeId: r.node, optionId: r.option });
  }
  return out;
}

/** The shop's strength weights as stored in its diagnosis settings (defaults for any it has not set). */
export async function shopWeights(conn: Db | Tx = db): Promise<WeightTable> {
  const rows = await conn.execute<{ value: unknown }>(sql`select value from settings where key = ${DIAGNOSIS_SETTINGS_KEY}`);
  return weightTable(parseDiagnosisSettings(rows[0]?.value).weights);
}
