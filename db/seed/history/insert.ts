import { eq, sql } from "drizzle-orm";
import type { Tx } from "@/db";
import { caseEvents, caseOutcomes, cases, caseSteps, outcomeCauses, outcomeParts, outcomeUpgrades } from "@/db/schema";
import { storePlannedTeardown } from "@/lib/bench/planned-teardown";
import { storeOutcomeCopies } from "@/lib/outcomes/outcome-copies";
import { storeTriageScores } from "@/lib/reports/triage-scores";
import type { TreeGraph } from "@/lib/trees/graph-types";
import type { SimCase } from "./simulate";

export interface HistoryIds {
  familyId: Map<string, number>;
  causeId: Map<string, number>;
  partId: Map<string, number>;
  userOfRole: Map<string, string>;
  graphs: Map<string, TreeGraph>;
}

function chunks<T>(items: T[], size: number): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += size) out.push(items.slice(i, i + size));
  return out;
}

const cents = (eur: number) => Math.round(eur * 100);

/** Writes simulated cases with their steps, outcomes and status history, in bulk. */
export async function insertHistory(tx: Tx, sims: SimCase[], ids: HistoryIds): Promise<number[]> {
  const caseIds: number[] = [];
  for (const batch of chunks(sims, 500)) {
    const rows = await tx
      .insert(cases)
      .values(batch.map((s) => {
        const graph = ids.graphs.get(s.treeSlug)!;
        return {
          reference: s.reference, status: s.status, callerName: s.callerName, callerKind: s.callerKind, phone: s.phone, email: s.email,
          familyId: ids.familyId.get(s.familySlug)!, serial: s.serial, ridingUse: s.ridingUse, symptom: s.symptom,
          treeVersionId: graph.versionId, technicianId: ids.userOfRole.get(s.technicianRole) ?? null, notes: s.notes,
          finalRanking: s.finalRanking, quoteLowCents: s.quote ? cents(s.quote.low) : null, quoteHighCents: s.quote ? cents(s.quote.high) : null,
          benchPlan: s.benchPlan, createdAt: s.createdAt, updatedAt: s.closedAt ?? s.triagedAt ?? s.createdAt,
          triagedAt: s.triagedAt, closedAt: s.closedAt,
          whatToSend: s.status === "advised" ? "" : "The drive unit only, with its cover and mounting bolts; no battery.",
        };
      }))
      .returning({ id: cases.id });
    caseIds.push(...rows.map((r) => r.id));
  }

  const nodeId = new Map<string, Map<string, number>>();
  const optionId = new Map<string, Map<string, number>>();
  for (const [slug, g] of ids.graphs) {
    nodeId.set(slug, new Map(g.nodes.map((n) => [n.key, n.id])));
    optionId.set(slug, new Map(g.options.map((o) => [o.key, o.id])));
  }
  const stepRows = sims.flatMap((s, i) => s.steps.map((step, seq) => ({
    caseId: caseIds[i], seq: seq + 1, nodeId: nodeId.get(s.treeSlug)!.get(step.nodeKey)!, optionId: optionId.get(s.treeSlug)!.get(step.optionKey)!,
    answeredBy: ids.userOfRole.get(s.technicianRole) ?? null, answeredAt: step.at, ranking: step.ranking,
  })));
  for (const batch of chunks(stepRows, 1000)) await tx.insert(caseSteps).values(batch);

  const withOutcome = sims.map((s, i) => ({ s, id: caseIds[i] })).filter((x) => x.s.outcome);
  for (const batch of chunks(withOutcome, 1000)) {
    await tx.insert(caseOutcomes).values(batch.map(({ s, id }) => ({
      caseId: id, labourMinutes: s.outcome!.labourMinutes, upgrades: s.outcome!.upgrades, notes: s.outcome!.notes,
      recordedBy: ids.userOfRole.get(s.technicianRole) ?? null, recordedAt: s.closedAt ?? s.createdAt,
    })));
    await tx.insert(outcomeCauses).values(batch.flatMap(({ s, id }) => s.outcome!.causes.map((c) => ({ caseId: id, causeId: ids.causeId.get(c.slug)!, primary: c.primary }))));
    const partRows = batch.flatMap(({ s, id }) => {
      const merged = new Map<string, number>();
      for (const p of s.outcome!.parts) merged.set(p.slug, (merged.get(p.slug) ?? 0) + p.quantity);
      return [...merged].map(([slug, quantity]) => ({ caseId: id, partId: ids.partId.get(slug)!, quantity }));
    });
    if (partRows.length) await tx.insert(outcomeParts).values(partRows);
    const upgradeRows = batch.flatMap(({ s, id }) => s.outcome!.upgradeKinds.map((upgrade) => ({ caseId: id, upgrade })));
    if (upgradeRows.length) await tx.insert(outcomeUpgrades).values(upgradeRows);
    await storeOutcomeCopies(tx, batch.map(({ id }) => id));
    await storeTriageScores(tx, batch.map(({ id }) => id));
    await storePlannedTeardown(tx, batch.map(({ id }) => id));
  }

  const events = sims.flatMap((s, i) => {
    const by = ids.userOfRole.get(s.technicianRole) ?? null;
    const list: (typeof caseEvents.$inferInsert)[] = [{ caseId: caseIds[i], kind: "created", toStatus: "open", byUserId: by, at: s.createdAt }];
    if (s.triagedAt && s.status !== "open") {
      const finishedAs = s.status === "advised" ? "advised" : "booked_in";
      list.push({ caseId: caseIds[i], kind: "status", fromStatus: "open", toStatus: finishedAs, byUserId: by, at: s.triagedAt });
      if (s.status === "on_bench" || s.status === "closed") list.push({ caseId: caseIds[i], kind: "status", fromStatus: "booked_in", toStatus: "on_bench", byUserId: by, at: new Date(s.triagedAt.getTime() + 86_400_000) });
      if (s.status === "closed" && s.closedAt) list.push({ caseId: caseIds[i], kind: "status", fromStatus: "on_bench", toStatus: "closed", byUserId: by, at: s.closedAt });
    }
    return list;
  });
  for (const batch of chunks(events, 2000)) await tx.insert(caseEvents).values(batch);

  for (const [i, s] of sims.entries()) {
    if (s.repeatOf !== null) await tx.update(cases).set({ repeatOfCaseId: caseIds[s.repeatOf] }).where(eq(cases.id, caseIds[i]));
  }
  await tx.execute(sql`analyze cases`);
  return caseIds;
}
