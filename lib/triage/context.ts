import "server-only";
import { sql } from "@/db";
import type { CaseStatus } from "@/db/schema";
import type { DxSettings } from "@/lib/diagnosis";
import { learnedLikelihoodsFor } from "@/lib/review/learned";
import { cachedCase, rememberCase, type StoredCase } from "./context-cache";
import { DIAGNOSIS_SETTINGS_KEY, dxSettingsFor } from "./dx-settings";
import { familyHistory } from "./history";

export interface CaseContext extends Omit<StoredCase, "storedSettings"> {
  /** The engine's settings, derived from the stored ones and the family's confirmed history. */
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
  settings_hash: string | null;
  likelihood_mode: string;
}

/** The case, its steps, the shop's settings and the tree's likelihood setting, in one round trip. */
async function readCase(caseId: number): Promise<StoredCase | null> {
  const rows = await sql<Row[]>`
    select c.id, c.reference, c.status, c.family_id, c.tree_version_id,
      coalesce((select json_agg(json_build_array(s.id, s.seq, s.node_id, s.option_id) order by s.seq)
                from case_steps s where s.case_id = c.id), '[]'::json) as steps,
      st.value as settings, md5(st.value::text) as settings_hash,
      (select t.likelihood_mode from tree_versions v join trees t on t.id = v.tree_id where v.id = c.tree_version_id) as likelihood_mode
    from cases c left join settings st on st.key = ${DIAGNOSIS_SETTINGS_KEY}
    where c.id = ${caseId}`;
  const row = rows[0];
  if (!row) return null;
  return {
    id: row.id,
    reference: row.reference,
    status: row.status,
    familyId: row.family_id,
    treeVersionId: row.tree_version_id,
    steps: row.steps.map(([id, seq, nodeId, optionId]) => ({ id, seq, nodeId, optionId })),
    storedSettings: row.settings,
    basis: { settingsHash: row.settings_hash, likelihoodMode: row.likelihood_mode },
  };
}

/**
 * Everything an answer needs from the database — see readCase — plus the confirmed history of the
 * case's motor family (familyHistory, usually cached). With `reuse`, an open case this process
 * has just read or written is taken from memory (context-cache.ts): the step insert's guards
 * refuse a step computed from anything that has changed since, and the caller then reads afresh.
 */
export async function loadCaseContext(caseId: number, options: { reuse?: boolean } = {}): Promise<CaseContext | null> {
  let stored = options.reuse ? cachedCase(caseId) : null;
  if (!stored) {
    stored = await readCase(caseId);
    if (!stored) return null;
    rememberCase(stored);
  }
  const settings = dxSettingsFor(stored.storedSettings, await familyHistory(stored.familyId));
  // A tree set to "learned" scores with likelihoods learned from closed cases (lib/review, cached there).
  if (stored.basis.likelihoodMode === "learned") settings.likelihoods = await learnedLikelihoodsFor(stored.treeVersionId);
  return {
    id: stored.id,
    reference: stored.reference,
    status: stored.status,
    familyId: stored.familyId,
    treeVersionId: stored.treeVersionId,
    steps: stored.steps.map((s) => ({ ...s })),
    settings,
    basis: { ...stored.basis },
  };
}
