import "server-only";
import { sql as pg } from "@/db";
import type { RankingRow, RankingScores } from "@/lib/diagnosis";
import { ScoreAccumulator } from "./score-merge";
import { inScope, type ReportScope } from "./scope";

export const UNLISTED = "unlisted";
const BATCH = 2000;

export interface VersionAccuracy {
  versionId: number;
  treeId: number;
  treeSlug: string;
  treeTitle: string;
  versionNumber: number;
  scores: RankingScores;
}

/**
 * The truth a ranking is scored against: the primary confirmed cause. A confirmed cause the tree
 * does not list (or an "other" outcome) is the tree's unlisted hypothesis being right.
 */
export function truthFor(ranking: Record<string, number>, primarySlug: string | null): string {
  return primarySlug && Object.hasOwn(ranking, primarySlug) && primarySlug !== UNLISTED ? primarySlug : UNLISTED;
}

/** (version, final ranking, primary cause) of the scored cases; exported for the benchmark's EXPLAIN. */
export function accuracyRowsQuery(scope: ReportScope) {
  return pg<{ v: number; r: Record<string, number>; truth: string | null }[]>`
    select c.tree_version_id as v, c.final_ranking as r, ca.slug as truth
    from cases c
    left join outcome_causes oc on oc.case_id = c.id and oc.is_primary
    left join causes ca on ca.id = oc.cause_id
    where ${inScope(scope)} and c.final_ranking is not null`;
}

/**
 * Tree accuracy per tree version on the closed cases in scope that were triaged on a tree, i.e. that
 * keep the ranking shown at the end of triage (imported records have none and are skipped; a
 * triage that concluded before any answer still made a prediction and counts): top-1 / top-3 hit rate of the ranking at
 * the end of triage, Brier score, log loss and calibration, all from rankingScores. Only
 * (version, final ranking, primary cause) triples leave Postgres, in batches.
 */
export async function treeAccuracy(scope: ReportScope): Promise<VersionAccuracy[]> {
  const acc = new Map<number, { scorer: ScoreAccumulator; pending: RankingRow[] }>();
  const cursor = accuracyRowsQuery(scope).cursor(BATCH);
  for await (const rows of cursor) {
    for (const row of rows) {
      const entry = acc.get(row.v) ?? { scorer: new ScoreAccumulator(), pending: [] };
      acc.set(row.v, entry);
      entry.pending.push({ probabilities: row.r, confirmed: truthFor(row.r, row.truth) });
      if (entry.pending.length >= BATCH) {
        entry.scorer.add(entry.pending);
        entry.pending = [];
      }
    }
  }
  if (acc.size === 0) return [];
  for (const entry of acc.values()) entry.scorer.add(entry.pending);

  const versions = await pg<{ id: number; treeId: number; slug: string; title: string; number: number }[]>`
    select v.id, v.tree_id as "treeId", t.slug, t.title, v.number
    from tree_versions v join trees t on t.id = v.tree_id
    where v.id in ${pg([...acc.keys()])}`;
  return versions
    .map((v) => ({
      versionId: v.id, treeId: v.treeId, treeSlug: v.slug, treeTitle: v.title, versionNumber: v.number,
      scores: acc.get(v.id)!.scorer.result()!,
    }))
    .sort((a, b) => a.treeTitle.localeCompare(b.treeTitle) || a.versionNumber - b.versionNumber);
}
