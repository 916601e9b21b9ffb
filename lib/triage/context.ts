import "server-only";
import { sql } from "@/db";
import type { CaseStatus } from "@/db/schema";
import type { DxSettings } from "@/lib/diagnosis";
import { likelihoodsInUse, type LikelihoodMode } from "@/lib/review/in-use";
import { storedLikelihoods } from "@/lib/review/learned";
import { DIAGNOSIS_SETTINGS_KEY, dxSettingsFor } from "./dx-settings";

/** A case as an answer, an undo or the finish needs it, with the engine settings it is scored with. */
export interface CaseContext {
  id: number;
  reference: string;
  status: CaseStatus;
  familyId: number;
  treeVersionId: number;
  /** Recorded steps in order, with database ids. */
  steps: { id: number; seq: number; nodeId: number; optionId: number }[];
  /** The engine's settings: the shop's stored ones and the family's confirmed history. */
  settings: DxSettings;
  /** What the settings were worked out from; a step is stored only while these are still current. */
  basis: { settingsHash: string | null; likelihoodMode: string };
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
  learned_from: number;
  history: Record<string, number>;
}

/**
 * The case, its steps, the shop's settings, the tree's likelihood setting, how many closed cases
 * its version's stored table was learned from and the confirmed history of its motor family, in
 * one query and without a lock; then, where the tree's setting and that count say so, the stored
 * learned likelihoods. The history is the count of each confirmed cause over the family's closed
 * cases (the counts that move the priors), from the copy of each case's confirmed causes on its row
 * (`confirmed_cause_ids`, kept equal to outcome_causes by `storeOutcomeCopies`), read from
 * cases_family_history_idx alone. With `historyAsOfStart` it counts only cases closed before this
 * one was started, as its technician's screen did.
 */
export async function loadCaseContext(caseId: number, options: { historyAsOfStart?: boolean } = {}): Promise<CaseContext | null> {
  const [row] = await sql<Row[]>`
    select c.id, c.reference, c.status, c.family_id, c.tree_version_id,
      coalesce((select json_agg(json_build_array(s.id, s.seq, s.node_id, s.option_id) order by s.seq)
                from case_steps s where s.case_id = c.id), '[]'::json) as steps,
      st.value as settings, md5(st.value::text) as settings_hash,
      (select t.likelihood_mode from tree_versions v join trees t on t.id = v.tree_id where v.id = c.tree_version_id) as likelihood_mode,
      coalesce((select l.cases from learned_likelihoods l where l.version_id = c.tree_version_id), 0) as learned_from,
      coalesce((select json_object_agg(h.slug, h.n) from (
        select k.slug, count(*)::int as n
        from cases hc
        cross join lateral unnest(hc.confirmed_cause_ids) as confirmed(cause_id)
        join causes k on k.id = confirmed.cause_id
        where hc.family_id = c.family_id and hc.status = 'closed'
          and (not ${options.historyAsOfStart ?? false}::boolean or hc.closed_at < c.created_at)
        group by k.slug) h), '{}'::json) as history
    from cases c left join settings st on st.key = ${DIAGNOSIS_SETTINGS_KEY}
    where c.id = ${caseId}`;
  if (!row) return null;
  const learning = likelihoodsInUse(row.likelihood_mode as LikelihoodMode, row.learned_from).source === "learned";
  const settings = dxSettingsFor(row.settings, row.history);
  const learned = learning ? await storedLikelihoods(row.tree_version_id) : undefined;
  if (learned) settings.likelihoods = learned;
  return {
    id: row.id,
    reference: row.reference,
    status: row.status,
    familyId: row.family_id,
    treeVersionId: row.tree_version_id,
    steps: row.steps.map(([id, seq, nodeId, optionId]) => ({ id, seq, nodeId, optionId })),
    settings,
    basis: { settingsHash: row.settings_hash, likelihoodMode: row.likelihood_mode },
  };
}
