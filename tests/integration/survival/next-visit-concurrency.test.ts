import { beforeAll, describe, expect, it } from "vitest";
import { sql as pg } from "@/db";
import { executeAction } from "@/lib/actions/define";
import { saveOutcomeAction } from "@/lib/outcomes/actions";
import { prng } from "@/lib/random";
import { startCaseAction } from "@/lib/triage/start";
import { createRoleUsers } from "../../support/db";
import { casesWithStaleNextVisit } from "../../support/next-visit-copies";
import { resetToDemo } from "../../support/seed";
import { day, demoIds, insertCases, type DemoIds } from "../reports/fixtures";

const F = "orvanta-tessel-2";
const SERIAL = "RACE-1";
const ROUNDS = 30;
const CAUSES = ["owc-cage-broken", "owc-rollers-worn", "crank-seal-worn", "belt-worn", "torque-sensor-drift"];

// Every writer of one unit's visits at once: bookings, visits imported between others, bench
// outcomes saved through the real action, confirmed causes changed in a transaction that holds its
// locks a while, and deletes. The trigger keeping the next-visit copies locks the case row first,
// then only the visit before it: no deadlock (SQLSTATE 40P01), and every copy right afterwards.
describe("one unit's visits written by many transactions at once", () => {
  let ids: DemoIds;
  let users: Awaited<ReturnType<typeof createRoleUsers>>;
  const next = prng(19);
  const pick = <T,>(list: readonly T[]) => list[Math.floor(next() * list.length)];
  const pause = () => new Promise((resolve) => setTimeout(resolve, Math.floor(next() * 5)));

  beforeAll(async () => {
    await resetToDemo();
    users = await createRoleUsers();
    ids = await demoIds();
  });

  const onBench = () => pg<{ id: number }[]>`select id from cases where serial = ${SERIAL} and status = 'on_bench' order by id`;

  /** A visit of the unit imported at some past time, in a transaction that stays open a moment after the insert. */
  const importVisit = (at: Date) => pg.begin(async (tx) => {
    await tx`
      insert into cases (reference, status, caller_name, caller_kind, family_id, serial, riding_use, symptom, tree_version_id, created_at, closed_at)
      values (${`RACE-${Math.floor(next() * 1e9)}`}, 'closed', 'Import', 'rider', ${ids.family(F)}, ${SERIAL}, 'road', 'pedal-slip',
              ${ids.version("pedal-slip").id}, ${at.toISOString()}, ${at.toISOString()})`;
    await tx`select pg_sleep(${next() * 0.02})`;
  });

  /** Confirmed causes changed as the bench outcome writer does it (case row first, then the outcome, then its copy), held a moment. */
  const changeCauses = (caseId: number, slug: string) => pg.begin(async (tx) => {
    await tx`select id from cases where id = ${caseId} for update`;
    await tx`delete from outcome_causes where case_id = ${caseId}`;
    await tx`insert into outcome_causes (case_id, cause_id, is_primary) values (${caseId}, ${ids.cause(slug)}, true)`;
    await tx`update cases set primary_cause_id = ${ids.cause(slug)}, confirmed_cause_ids = ${[ids.cause(slug)]} where id = ${caseId}`;
    await tx`select pg_sleep(${next() * 0.02})`;
  });

  const book = () => executeAction(startCaseAction, {
    callerName: "Rider", callerKind: "rider", phone: "0100 000000", email: "", familyId: String(ids.family(F)), serial: SERIAL,
    ridingUse: "road", treeVersionId: String(ids.version("pedal-slip").id),
  }, users.tech);

  const save = (caseId: number) => executeAction(saveOutcomeAction, { caseId: String(caseId), labourMinutes: "15", causeId: String(ids.cause(pick(CAUSES))) }, users.tech);

  it(`${ROUNDS} rounds of bookings, imports, outcomes, cause changes and deletes on one serial`, async () => {
    const failures: unknown[] = [];
    for (let round = 0; round < ROUNDS; round++) {
      // A few visits on the bench to save outcomes on and change, between old closed ones.
      await insertCases(ids, [
        ...Array.from({ length: 3 }, () => ({ family: F, tree: "pedal-slip", serial: SERIAL, createdAt: day(`2025-0${1 + Math.floor(next() * 9)}-1${Math.floor(next() * 9)}`), closedAt: null, status: "on_bench" as const })),
        { family: F, tree: "pedal-slip", serial: SERIAL, createdAt: day("2024-06-01"), closedAt: day("2024-06-05"), primary: pick(CAUSES) },
      ]);
      const bench = (await onBench()).map((r) => r.id);
      const [saved, changed, deleted] = [bench.at(-1)!, bench.at(-2)!, bench.at(-3)!];
      const at = () => new Date(day("2025-01-01").getTime() + Math.floor(next() * 270) * 86_400_000);
      const jobs: (() => Promise<unknown>)[] = [
        book, book, () => importVisit(at()), () => importVisit(at()),
        () => save(saved), () => changeCauses(changed, pick(CAUSES)), () => changeCauses(saved, pick(CAUSES)),
        () => pg`delete from cases where id = ${deleted}`,
      ];
      const settled = await Promise.allSettled(jobs.map(async (job) => {
        await pause();
        return job();
      }));
      for (const outcome of settled) {
        if (outcome.status === "rejected") failures.push(outcome.reason);
        else if (outcome.value && typeof outcome.value === "object" && "ok" in outcome.value && !outcome.value.ok) failures.push(outcome.value);
      }
      expect(failures).toEqual([]);
      expect(await casesWithStaleNextVisit()).toEqual([]);
    }
    const [{ visits }] = await pg<{ visits: number }[]>`select count(*)::int as visits from cases where serial = ${SERIAL}`;
    expect(visits).toBe(ROUNDS * (4 + 2 + 2 - 1));
  });
});
