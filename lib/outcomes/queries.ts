import "server-only";
import { and, asc, desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { caseEvents, caseOutcomes, cases, causes, outcomeCauses, outcomeParts, outcomeUpgrades, parts, uploads, users, type CaseStatus, type UpgradeKind } from "@/db/schema";
import { repeatLinksOf, type RepeatLink } from "./repeat";

export interface OutcomeView {
  caseId: number;
  reference: string;
  status: CaseStatus;
  serial: string;
  finalRanking: Record<string, number> | null;
  outcome: {
    otherCause: string;
    upgrades: string;
    labourMinutes: number;
    notes: string;
    recordedAt: Date;
    recordedBy: string | null;
  } | null;
  causes: { id: number; slug: string; name: string; primary: boolean }[];
  parts: { id: number; slug: string; name: string; sku: string; quantity: number }[];
  /** Upgrades from the shop's list, followed on the "Does it last?" page. */
  upgradeKinds: UpgradeKind[];
  photos: { id: string; originalName: string; width: number | null; height: number | null }[];
  repeats: RepeatLink[];
  reopenings: { at: Date; by: string | null; note: string }[];
}

export interface OutcomeCatalogue {
  causes: { id: number; slug: string; name: string; area: string }[];
  parts: { id: number; slug: string; name: string; sku: string }[];
}

/** What the bench-outcome section of a case page shows; null when the case does not exist. */
export async function loadOutcomeView(caseId: number): Promise<OutcomeView | null> {
  const [c] = await db
    .select({ id: cases.id, reference: cases.reference, status: cases.status, serial: cases.serial, finalRanking: cases.finalRanking })
    .from(cases).where(eq(cases.id, caseId)).limit(1);
  if (!c) return null;
  const [outcomeRows, causeRows, partRows, upgradeRows, photoRows, repeats, reopenRows] = await Promise.all([
    db.select({
      otherCause: caseOutcomes.otherCause, upgrades: caseOutcomes.upgrades, labourMinutes: caseOutcomes.labourMinutes,
      notes: caseOutcomes.notes, recordedAt: caseOutcomes.recordedAt, recordedBy: users.name,
    }).from(caseOutcomes).leftJoin(users, eq(users.id, caseOutcomes.recordedBy)).where(eq(caseOutcomes.caseId, caseId)).limit(1),
    db.select({ id: causes.id, slug: causes.slug, name: causes.name, primary: outcomeCauses.primary })
      .from(outcomeCauses).innerJoin(causes, eq(causes.id, outcomeCauses.causeId))
      .where(eq(outcomeCauses.caseId, caseId)).orderBy(desc(outcomeCauses.primary), asc(causes.name)),
    db.select({ id: parts.id, slug: parts.slug, name: parts.name, sku: parts.sku, quantity: outcomeParts.quantity })
      .from(outcomeParts).innerJoin(parts, eq(parts.id, outcomeParts.partId))
      .where(eq(outcomeParts.caseId, caseId)).orderBy(asc(parts.name)),
    db.select({ upgrade: outcomeUpgrades.upgrade }).from(outcomeUpgrades).where(eq(outcomeUpgrades.caseId, caseId)).orderBy(asc(outcomeUpgrades.upgrade)),
    db.select({ id: uploads.id, originalName: uploads.originalName, width: uploads.width, height: uploads.height })
      .from(uploads).where(eq(uploads.caseId, caseId)).orderBy(asc(uploads.createdAt)),
    repeatLinksOf(caseId),
    db.select({ at: caseEvents.at, by: users.name, note: caseEvents.note })
      .from(caseEvents).leftJoin(users, eq(users.id, caseEvents.byUserId))
      .where(and(eq(caseEvents.caseId, caseId), eq(caseEvents.kind, "reopened"))).orderBy(desc(caseEvents.at)),
  ]);
  return {
    caseId: c.id, reference: c.reference, status: c.status, serial: c.serial, finalRanking: c.finalRanking,
    outcome: outcomeRows[0] ?? null, causes: causeRows, parts: partRows, upgradeKinds: upgradeRows.map((u) => u.upgrade), photos: photoRows, repeats, reopenings: reopenRows,
  };
}

export async function loadOutcomeCatalogue(): Promise<OutcomeCatalogue> {
  const [causeRows, partRows] = await Promise.all([
    db.select({ id: causes.id, slug: causes.slug, name: causes.name, area: causes.area }).from(causes)
      .where(eq(causes.active, true)).orderBy(asc(causes.area), asc(causes.name)),
    db.select({ id: parts.id, slug: parts.slug, name: parts.name, sku: parts.sku }).from(parts).orderBy(asc(parts.name)),
  ]);
  return { causes: causeRows, parts: partRows };
}
