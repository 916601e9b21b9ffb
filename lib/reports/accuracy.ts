import "server-only";
import { sql as pg } from "@/db";
import { CALIBRATION_BINS, type CalibrationBin, type RankingScores } from "@/lib/diagnosis";
import { inScope, type ReportScope } from "./scope";

export { truthFor, UNLISTED } from "./triage-scores";

export interface VersionAccuracy {
  versionId: number;
  treeId: number;
  treeSlug: string;
  treeTitle: string;
  versionNumber: number;
  scores: RankingScores;
}

/** Sums of the stored triage scores of one tree version's cases in one calibration bin. */
export interface ScoreSums {
  v: number;
  bin: number;
  n: number;
  top1: number;
  top3: number;
  brier: number;
  logLoss: number;
  predicted: number;
}

/** The stored triage scores in scope, summed per (version, calibration bin); exported for the benchmark's EXPLAIN. */
export function accuracySumsQuery(scope: ReportScope) {
  return pg<ScoreSums[]>`
    select c.tree_version_id as v, least(${CALIBRATION_BINS - 1}, floor(s.top_p * ${CALIBRATION_BINS}))::int as bin,
           count(*)::int as n, (count(*) filter (where s.confirmed_rank = 1))::int as top1,
           (count(*) filter (where s.confirmed_rank <= 3))::int as top3,
           sum(s.brier)::float8 as brier, sum(s.log_loss)::float8 as "logLoss", sum(s.top_p)::float8 as predicted
    from cases c
    join triage_scores s on s.case_id = c.id
    where ${inScope(scope)}
    group by 1, 2`;
}

/** rankingScores' result from per-bin sums of rankingRowScore: the means, and all calibration bins. */
export function scoresFromSums(bins: Omit<ScoreSums, "v">[]): RankingScores {
  const n = bins.reduce((t, b) => t + b.n, 0);
  const total = (key: "top1" | "top3" | "brier" | "logLoss") => bins.reduce((t, b) => t + b[key], 0) / n;
  const calibration: CalibrationBin[] = Array.from({ length: CALIBRATION_BINS }, (_, i) => {
    const b = bins.find((x) => x.bin === i);
    return {
      from: i / CALIBRATION_BINS, to: (i + 1) / CALIBRATION_BINS, n: b?.n ?? 0,
      meanPredicted: b ? b.predicted / b.n : 0, observed: b ? b.top1 / b.n : 0,
    };
  });
  return { n, top1: total("top1"), top3: total("top3"), brier: total("brier"), logLoss: total("logLoss"), calibration };
}

/**
 * Tree accuracy per tree version on the closed cases in scope that were triaged on a tree, i.e. that
 * keep the ranking shown at the end of triage (imported records have none and are skipped; a
 * triage that concluded before any answer still made a prediction and counts): top-1 / top-3 hit
 * rate of the ranking at the end of triage, Brier score, log loss and calibration, as rankingScores
 * gives them. Each case was scored once, with its outcome (triage_scores); Postgres adds them up.
 */
export async function treeAccuracy(scope: ReportScope): Promise<VersionAccuracy[]> {
  const sums = await accuracySumsQuery(scope);
  if (sums.length === 0) return [];
  const byVersion = new Map<number, ScoreSums[]>();
  for (const s of sums) byVersion.set(s.v, [...(byVersion.get(s.v) ?? []), s]);
  const versions = await pg<{ id: number; treeId: number; slug: string; title: string; number: number }[]>`
    select v.id, v.tree_id as "treeId", t.slug, t.title, v.number
    from tree_versions v join trees t on t.id = v.tree_id
    where v.id in ${pg([...byVersion.keys()])}`;
  return versions
    .map((v) => ({
      versionId: v.id, treeId: v.treeId, treeSlug: v.slug, treeTitle: v.title, versionNumber: v.number,
      scores: scoresFromSums(byVersion.get(v.id)!),
    }))
    .sort((a, b) => a.treeTitle.localeCompare(b.treeTitle) || a.versionNumber - b.versionNumber);
}
