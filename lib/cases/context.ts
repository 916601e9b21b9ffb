import "server-only";
import { sql } from "@/db";
import type { CaseStatus } from "@/db/schema";
import type { DxSettings } from "@/lib/diagnosis";
import { learnedLikelihoodsFor } from "@/lib/review/learned";
import { DIAGNOSIS_SETTINGS_KEY, dxSettingsFor } from "./dx-settings";
import { familyHistory } from "./history";

export interface CaseContext {
  id: number;
  reference: string;
  status: CaseStatus;
  familyId: number;
  treeVersionId: number;
  /** Recorded steps in order, with database ids. */
  steps: { id: number; seq: number; nodeId: number; optionId: number }[];
  settings: DxSettings;
}

interface Row {
  id: number;
  reference: string;
  status: CaseStatus;
  family_id: number;
  tree_version_id: number;
  steps: [number, number, number, number][];
  settings: unknown;
  likelihood_mode: string;
}

/**
 * Everything an answer needs from the database in one round trip — the case, its steps, the
 * shop's settings and the tree's likelihood setting — plus the confirmed history of the case's
 * motor family (see familyHistory, usually cached).
 */
export async function loadCaseContext(caseId: number): Promise<CaseContext | null> {
  const rows = await sql<Row[]>`
    select c.id, c.reference, c.status, c.family_id, c.tree_version_id,
      coalesce((select json_agg(json_build_array(s.id, s.seq, s.node_id, s.option_id) order by s.seq)
                from case_steps s where s.case_id = c.id), '[]'::json) as steps,
      (select value from settings where key = ${DIAGNOSIS_SETTINGS_KEY}) as settings,
      (select t.likelihood_mode from tree_versions v join trees t on t.id = v.tree_id where v.id = c.tree_version_id) as likelihood_mode
    from cases c where c.id = ${caseId}`;
  const row = rows[0];
  if (!row) return null;
  const settings = dxSettingsFor(row.settings, await familyHistory(row.family_id));
  // A tree set to "learned" scores with likelihoods learned from closed cases (lib/review, cached there).
  if (row.likelihood_mode === "learned") settings.likelihoods = await learnedLikelihoodsFor(row.tree_version_id);
  return {
    id: row.id,
    reference: row.reference,
    status: row.status,
    familyId: row.family_id,
    treeVersionId: row.tree_version_id,
    steps: row.steps.map(([id, seq, nodeId, optionId]) => ({ id, seq, nodeId, optionId })),
    settings,
  };
}
