import { readFileSync } from "node:fs";
import path from "node:path";
import { and, eq, sql } from "drizzle-orm";
import { z } from "zod";
import type { Tx } from "@/db";
import { caseEvents, cases, causeLocations, outcomeCauses, RIDING_USES, CALLER_KINDS } from "@/db/schema";
import { slugSchema } from "@/lib/trees/file/schema";
import { storeOutcomeCopies } from "@/lib/outcomes/outcome-copies";
import { Random } from "@/lib/random";

const benchDemoSchema = z.strictObject({
  format: z.literal("rootbench-bench-demo"),
  formatVersion: z.literal(1),
  notes: z.string(),
  seed: z.number().int(),
  companions: z.array(z.strictObject({ given: slugSchema, companion: slugSchema, share: z.number().min(0).max(1) })),
  showcase: z.strictObject({
    reference: z.string().min(1),
    family: slugSchema,
    tree: slugSchema,
    callerName: z.string().min(1),
    callerKind: z.enum(CALLER_KINDS),
    email: z.email().refine((e) => e.endsWith(".test"), "a .test address"),
    serial: z.string(),
    ridingUse: z.enum(RIDING_USES),
    notes: z.string(),
    finalRanking: z.record(z.string(), z.number().min(0).max(1)),
  }),
});
export type BenchDemo = z.infer<typeof benchDemoSchema>;

export function loadBenchDemo(contentDir: string): BenchDemo {
  return benchDemoSchema.parse(JSON.parse(readFileSync(path.join(contentDir, "history/bench-demo.json"), "utf8")));
}

interface Ids {
  familyId: ReadonlyMap<string, number>;
  causeId: ReadonlyMap<string, number>;
  userOfRole: ReadonlyMap<string, string>;
  versionOf: ReadonlyMap<string, number>;
}

/**
 * Faults that come in company: adds the listed companion as a further confirmed cause to a seeded
 * share of the closed cases whose primary cause is the given one, where the family locates both.
 */
export async function seedCompanions(tx: Tx, demo: BenchDemo, ids: Ids): Promise<number> {
  const rng = new Random(demo.seed);
  const located = await tx.select({ familyId: causeLocations.familyId, causeId: causeLocations.causeId }).from(causeLocations);
  const has = new Set(located.map((l) => `${l.familyId}:${l.causeId}`));
  let added = 0;
  for (const rule of demo.companions) {
    const given = ids.causeId.get(rule.given);
    const companion = ids.causeId.get(rule.companion);
    if (given === undefined || companion === undefined) throw new Error(`bench-demo.json: unknown cause in ${rule.given} → ${rule.companion}`);
    const rows = await tx.select({ caseId: cases.id, familyId: cases.familyId }).from(outcomeCauses)
      .innerJoin(cases, eq(cases.id, outcomeCauses.caseId))
      .where(and(eq(outcomeCauses.causeId, given), eq(outcomeCauses.primary, true), eq(cases.status, "closed")))
      .orderBy(cases.id);
    const picked = rows.filter((r) => has.has(`${r.familyId}:${companion}`) && rng.chance(rule.share));
    if (picked.length === 0) continue;
    const inserted = await tx.insert(outcomeCauses).values(picked.map((r) => ({ caseId: r.caseId, causeId: companion, primary: false })))
      .onConflictDoNothing().returning({ caseId: outcomeCauses.caseId });
    await storeOutcomeCopies(tx, inserted.map((r) => r.caseId));
    added += inserted.length;
  }
  return added;
}

/** One unit on the bench, booked in after a phone triage, for the teardown checklist. */
export async function seedShowcase(tx: Tx, demo: BenchDemo, ids: Ids): Promise<number> {
  const s = demo.showcase;
  const familyId = ids.familyId.get(s.family);
  const versionId = ids.versionOf.get(s.tree);
  if (familyId === undefined || versionId === undefined) throw new Error(`bench-demo.json: unknown family ${s.family} or tree ${s.tree}`);
  const [{ symptom }] = await tx.execute<{ symptom: string }>(sql`select t.symptom from trees t join tree_versions v on v.tree_id = t.id where v.id = ${versionId}`);
  const tech = ids.userOfRole.get("tech") ?? null;
  const now = new Date();
  const triaged = new Date(now.getTime() - 3 * 24 * 3600_000);
  const [row] = await tx.insert(cases).values({
    reference: s.reference, status: "on_bench", callerName: s.callerName, callerKind: s.callerKind, email: s.email, familyId,
    serial: s.serial, ridingUse: s.ridingUse, symptom, treeVersionId: versionId, technicianId: tech, notes: s.notes,
    finalRanking: s.finalRanking, whatToSend: "The drive unit only, with its cover and mounting bolts; no battery.",
    createdAt: triaged, triagedAt: triaged, updatedAt: now,
  }).returning({ id: cases.id });
  await tx.insert(caseEvents).values([
    { caseId: row.id, kind: "created", toStatus: "open", byUserId: tech, at: triaged },
    { caseId: row.id, kind: "booked_in", fromStatus: "open", toStatus: "booked_in", byUserId: tech, at: triaged },
    { caseId: row.id, kind: "status", fromStatus: "booked_in", toStatus: "on_bench", byUserId: tech, at: now },
  ]);
  return row.id;
}
