// Expected teardown minutes of the assembly-aware plan (bottom-up P-over-C) against the flat p/c
// plan, on the demo shop's closed cases: same stages, same probabilities (each case's ranking at
// the end of triage). `npm run bench teardown`, or with DATABASE_URL naming a seeded database:
// `npx tsx --conditions=react-server scripts/bench/teardown.ts`. Cases cloned by the reports
// benchmark (references "BN-…") are left out, so the figures are the demo history's own.
import { sql as pg } from "../../db";
import { median, planMinutes } from "../../lib/bench/compare";
import { causeCatalogue, causeLocationsByFamily, stagesByFamily } from "../../lib/bench/queries";
import { familyBench } from "../../lib/bench/start";
import { groupBy } from "../../lib/group-by";

const mean = (xs: number[]) => xs.reduce((s, x) => s + x, 0) / xs.length;

interface Row { familyId: number; family: string; ranking: Record<string, number> }

async function main(): Promise<void> {
  const rows = await pg<Row[]>`
    select c.family_id as "familyId", f.name || ' ' || f.generation as family, c.final_ranking as ranking
    from cases c join motor_families f on f.id = c.family_id
    where c.status = 'closed' and c.final_ranking is not null and c.reference not like 'BN-%'
    order by c.id`;
  const [stagesOf, catalogue, located] = await Promise.all([stagesByFamily(), causeCatalogue(), causeLocationsByFamily()]);

  const table: Record<string, string | number>[] = [];
  const savedAll: number[] = [];
  const percentAll: number[] = [];
  const catSavedAll: number[] = [];
  const catPercentAll: number[] = [];
  let differAll = 0;
  const started = performance.now();
  for (const [familyId, cases] of groupBy(rows, (r) => r.familyId)) {
    const stored = stagesOf.get(familyId) ?? [];
    if (stored.length === 0) continue;
    const bench = familyBench(stored, catalogue, located.get(familyId) ?? []);
    const aware: number[] = [];
    const flat: number[] = [];
    const saved: number[] = [];
    const percent: number[] = [];
    const catSaved: number[] = [];
    const catPercent: number[] = [];
    let differ = 0;
    for (const c of cases) {
      const m = planMinutes(bench.stages, bench.causesAfter(c.ranking));
      aware.push(m.teardown);
      flat.push(m.flat);
      saved.push(m.flat - m.teardown);
      percent.push(m.flat > 0 ? ((m.flat - m.teardown) / m.flat) * 100 : 0);
      catSaved.push(m.catalogue - m.teardown);
      catPercent.push(m.catalogue > 0 ? ((m.catalogue - m.teardown) / m.catalogue) * 100 : 0);
      if (m.flat - m.teardown > 1e-9) differ++;
    }
    savedAll.push(...saved);
    percentAll.push(...percent);
    catSavedAll.push(...catSaved);
    catPercentAll.push(...catPercent);
    differAll += differ;
    table.push({
      family: cases[0].family, cases: cases.length,
      "flat p/c (median min)": median(flat).toFixed(1), "teardown plan (median min)": median(aware).toFixed(1),
      "saving (median min)": median(saved).toFixed(2), "saving (median %)": median(percent).toFixed(2),
      "saving (mean min)": mean(saved).toFixed(2), "cases saving": `${((differ / cases.length) * 100).toFixed(0)} %`,
      "vs phone plan (median min)": median(catSaved).toFixed(2), "vs phone plan (median %)": median(catPercent).toFixed(2),
      "never worse": [...saved, ...catSaved].every((s) => s >= -1e-9) ? "yes" : "NO",
    });
  }
  table.sort((a, b) => String(a.family).localeCompare(String(b.family)));
  table.push({
    family: "all families", cases: savedAll.length, "flat p/c (median min)": "", "teardown plan (median min)": "",
    "saving (median min)": median(savedAll).toFixed(2), "saving (median %)": median(percentAll).toFixed(2),
    "saving (mean min)": mean(savedAll).toFixed(2), "cases saving": `${((differAll / savedAll.length) * 100).toFixed(0)} %`,
    "vs phone plan (median min)": median(catSavedAll).toFixed(2), "vs phone plan (median %)": median(catPercentAll).toFixed(2),
    "never worse": [...savedAll, ...catSavedAll].every((s) => s >= -1e-9) ? "yes" : "NO",
  });
  console.table(table);
  console.log(`${savedAll.length} closed cases, both plans each, in ${(performance.now() - started).toFixed(0)} ms`);
}

main()
  .catch((error: unknown) => {
    console.error(error);
    process.exitCode = 1;
  })
  .finally(() => pg.end());
