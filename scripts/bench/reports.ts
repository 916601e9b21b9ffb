// Report queries on 100,000 closed cases: `npm run bench reports`, or with DATABASE_URL naming a
// seeded bench database: `npx tsx --conditions=react-server scripts/bench/reports.ts`.
// Each report is timed next to `select count(*)` over the same cases in the same run.
import { sql as pg } from "../../db";
import { planVsActual } from "../../lib/bench/plan-vs-actual";
import { accuracySumsQuery, treeAccuracy } from "../../lib/reports/accuracy";
import { causeCountsQuery, causePareto } from "../../lib/reports/pareto";
import { partsDemand, partsDemandQuery } from "../../lib/reports/parts";
import { parseReportFilter } from "../../lib/reports/period";
import { repeatRate } from "../../lib/reports/repeats";
import { inScope, resolveScope, type ReportScope } from "../../lib/reports/scope";
import { causeTrend, causeTrendQuery } from "../../lib/reports/trend";
import { followUpQuery } from "../../lib/survival/follow-ups";
import { followUpScope, loadSurvivalReport } from "../../lib/survival/report";

const TARGET = 100_000;
const RUNS = Number(process.env.BENCH_RUNS ?? 20);
const WARMUP = 3;

function guard(): void {
  const url = process.env.DATABASE_URL ?? "";
  // The generator adds a hundred thousand cases: never on the app's own database.
  if (!/bench/i.test(new URL(url || "postgres://x/none").pathname)) {
    throw new Error("Set DATABASE_URL to a database whose name contains \"bench\" (npm run bench does).");
  }
}

/**
 * Clones the seeded closed cases (steps, outcomes, causes, parts, upgrades, triage scores) until there are TARGET closed cases, dates
 * spread over 24 months. Each round of clones shares its serials, so units come back within a round.
 */
async function generate(): Promise<{ added: number; ms: number }> {
  const started = Date.now();
  const [{ n }] = await pg<{ n: number }[]>`select count(*)::int as n from cases where status = 'closed'`;
  const need = TARGET - n;
  if (need <= 0) return { added: 0, ms: 0 };
  await pg.begin(async (tx) => {
    await tx`select setseed(0.2026)`;
    await tx`create temp table bench_src on commit drop as
      select id, (row_number() over (order by id) - 1)::int as k from cases
      where status = 'closed' and final_ranking is not null`;
    await tx`create index on bench_src (k)`;
    await tx`create temp table bench_map on commit drop as
      select nextval('cases_id_seq')::int as new_id, s.id as old_id, g,
             now() - (random() * 730) * interval '1 day' as closed_at
      from generate_series(1, ${need}) g
      join bench_src s on s.k = g % (select count(*) from bench_src)`;
    await tx`create index on bench_map (old_id)`;
    await tx`
      insert into cases (id, reference, status, caller_name, caller_kind, phone, email, family_id, serial, riding_use, symptom,
        tree_version_id, technician_id, notes, final_ranking, quote_low_cents, quote_high_cents, bench_plan, what_to_send,
        repeat_of_case_id, primary_cause_id, confirmed_cause_ids, fitted_upgrades, part_ids, part_quantities,
        created_at, updated_at, triaged_at, closed_at)
      select m.new_id, 'BN-' || m.new_id, 'closed', c.caller_name, c.caller_kind, c.phone, c.email, c.family_id,
        case when c.serial = '' then '' else c.serial || '-' || (m.g / (select count(*) from bench_src)) end, c.riding_use, c.symptom,
        c.tree_version_id, c.technician_id, c.notes, c.final_ranking, c.quote_low_cents, c.quote_high_cents, c.bench_plan, c.what_to_send,
        case when c.repeat_of_case_id is not null then c.id end, c.primary_cause_id, c.confirmed_cause_ids,
        c.fitted_upgrades, c.part_ids, c.part_quantities,
        m.closed_at - (c.closed_at - c.created_at), m.closed_at, m.closed_at - (c.closed_at - c.triaged_at), m.closed_at
      from bench_map m join cases c on c.id = m.old_id`;
    // The steps' stored rankings are not read by any report; '{}' keeps the table to the size that matters.
    await tx`
      insert into case_steps (case_id, seq, node_id, option_id, answered_by, answered_at, ranking)
      select m.new_id, s.seq, s.node_id, s.option_id, s.answered_by, s.answered_at, '{}'::jsonb
      from bench_map m join case_steps s on s.case_id = m.old_id`;
    await tx`
      insert into case_outcomes (case_id, other_cause, upgrades, labour_minutes, planned_teardown_minutes, notes, recorded_by, recorded_at)
      select m.new_id, o.other_cause, o.upgrades, o.labour_minutes, o.planned_teardown_minutes, o.notes, o.recorded_by, m.closed_at
      from bench_map m join case_outcomes o on o.case_id = m.old_id`;
    await tx`insert into outcome_causes (case_id, cause_id, is_primary) select m.new_id, o.cause_id, o.is_primary from bench_map m join outcome_causes o on o.case_id = m.old_id`;
    await tx`insert into outcome_parts (case_id, part_id, quantity) select m.new_id, o.part_id, o.quantity from bench_map m join outcome_parts o on o.case_id = m.old_id`;
    await tx`insert into outcome_upgrades (case_id, upgrade) select m.new_id, o.upgrade from bench_map m join outcome_upgrades o on o.case_id = m.old_id`;
    // Same final ranking and outcome as the source, so the same triage score the app wrote at its close.
    await tx`
      insert into triage_scores (case_id, confirmed_rank, confirmed_p, top_p, brier, log_loss)
      select m.new_id, s.confirmed_rank, s.confirmed_p, s.top_p, s.brier, s.log_loss
      from bench_map m join triage_scores s on s.case_id = m.old_id`;
  });
  await settle();
  return { added: need, ms: Date.now() - started };
}

/**
 * What autovacuum does to tables soon after a bulk load (statistics, visibility map), done before
 * timing so every run measures the same settled tables instead of racing the daemon. A vacuum
 * cannot mark pages all-visible while an older snapshot is open (autovacuum's own analyze may hold
 * one for a moment), so it is repeated until the cases table is.
 */
async function settle(): Promise<void> {
  for (let attempt = 0; attempt < 30; attempt++) {
    await pg`vacuum (analyze) cases, case_steps, case_outcomes, outcome_causes, outcome_parts, outcome_upgrades, triage_scores`;
    const [{ share }] = await pg<{ share: number }[]>`select relallvisible::float8 / greatest(relpages, 1) as share from pg_class where relname = 'cases'`;
    if (share >= 0.95) return;
    await new Promise((resolve) => setTimeout(resolve, 1000));
  }
  console.log("warning: the cases table is not settled (an old snapshot stays open); figures may be off");
}

interface Timing {
  name: string;
  median: number;
  p95: number;
}

async function time(name: string, run: () => Promise<unknown>): Promise<Timing> {
  for (let i = 0; i < WARMUP; i++) await run();
  const samples: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t = performance.now();
    await run();
    samples.push(performance.now() - t);
  }
  samples.sort((a, b) => a - b);
  const at = (q: number) => samples[Math.min(samples.length - 1, Math.ceil(q * samples.length) - 1)];
  return { name, median: at(0.5), p95: at(0.95) };
}

async function scenario(label: string, scope: ReportScope, months: number) {
  const [{ n }] = await pg<{ n: number }[]>`select count(*)::int as n from cases c where ${inScope(scope)}`;
  const rows = [
    await time("count(*) over the same cases", () => pg`select count(*) from cases c where ${inScope(scope)}`),
    await time("cause Pareto", () => causePareto(scope)),
    await time("monthly trend (top 5 + rest)", () => causeTrend(scope)),
    await time("parts demand per month", () => partsDemand(scope)),
    await time("repeat-return rate", () => repeatRate(scope)),
    await time("tree accuracy (stored triage scores)", () => treeAccuracy(scope)),
    await time("bench plan against recorded labour", () => planVsActual(scope)),
    // Repairs closed in the last `months` months of the family: the same cases as the count, followed to today.
    await time("does it last? (follow-ups, curves, log-rank)", () => loadSurvivalReport({ familySlug: scope.filter.familySlug, ridingUse: null, months })),
  ];
  const base = rows[0].median;
  console.log(`\n${label}: ${n.toLocaleString("en-GB")} closed cases in scope, ${RUNS} runs each after ${WARMUP} warm-up runs`);
  console.log("query".padEnd(46), "median ms".padStart(10), "p95 ms".padStart(9), "× count".padStart(9));
  for (const r of rows) console.log(r.name.padEnd(46), r.median.toFixed(1).padStart(10), r.p95.toFixed(1).padStart(9), (r.median / base).toFixed(1).padStart(9));
  return rows;
}

async function main() {
  guard();
  const generated = await generate();
  console.log(`generated ${generated.added.toLocaleString("en-GB")} closed cases in ${(generated.ms / 1000).toFixed(1)} s`);
  const all = await resolveScope(parseReportFilter({ last: "24" }));
  const [family] = await pg<{ slug: string }[]>`select slug from motor_families order by id limit 1`;
  const one = await resolveScope(parseReportFilter({ last: "12", family: family.slug }));
  const a = await scenario("All families, last 24 months", all, 24);
  await scenario(`One family (${family.slug}), last 12 months`, one, 12);

  // The two slowest queries of the heavier scenario, as Postgres ran them.
  type Query = () => ReturnType<typeof causeCountsQuery>;
  const cast = (q: () => unknown) => q as Query;
  const { scope: followed } = await followUpScope({ familySlug: null, ridingUse: null, months: 24 });
  const candidates: [string, Query][] = [
    ["cause Pareto", () => causeCountsQuery(all)],
    ["monthly trend (top 5 + rest)", cast(() => causeTrendQuery(all))],
    ["parts demand per month", cast(() => partsDemandQuery(all))],
    ["tree accuracy (stored triage scores)", cast(() => accuracySumsQuery(all))],
    ["does it last? (follow-ups, curves, log-rank)", cast(() => followUpQuery(followed))],
  ];
  const ranked = candidates.map(([name, q]) => ({ name, q, t: a.find((r) => r.name === name)!.median })).sort((x, y) => y.t - x.t);
  for (const pick of ranked.slice(0, 2)) {
    const plan = await pg<{ "QUERY PLAN": string }[]>`explain (analyze, buffers) ${pick.q()}`;
    console.log(`\nEXPLAIN (ANALYZE, BUFFERS): ${pick.name}`);
    for (const line of plan) console.log(line["QUERY PLAN"]);
  }
}

main()
  .catch((error: unknown) => {
    console.error(error);
    process.exitCode = 1;
  })
  .finally(() => pg.end());
