import "server-only";
import { asc, eq } from "drizzle-orm";
import { db, type Db, type Tx } from "@/db";
import { causeParts, causes, motorFamilies, motorMakers, parts, type CauseArea } from "@/db/schema";
import type { CatalogueCauseRef } from "@/lib/trees/problems";

/** What tree validation and the editor's cause picker need of every cause. */
export interface CauseOption extends CatalogueCauseRef {
  name: string;
  area: CauseArea;
}

export function causeOptions(conn: Db | Tx = db): Promise<CauseOption[]> {
  return conn
    .select({ slug: causes.slug, name: causes.name, area: causes.area, inspectMinutes: causes.inspectMinutes, active: causes.active })
    .from(causes)
    .orderBy(asc(causes.area), asc(causes.name));
}

export interface CauseWithParts {
  id: number;
  slug: string;
  name: string;
  area: CauseArea;
  description: string;
  inspectMinutes: number;
  labourMinutes: number;
  priceLowCents: number;
  priceHighCents: number;
  ratingNm: number | null;
  active: boolean;
  parts: { slug: string; name: string; sku: string; quantity: number; unitPriceCents: number }[];
}

export async function listCauses(): Promise<CauseWithParts[]> {
  const [rows, links] = await Promise.all([
    db.select().from(causes).orderBy(asc(causes.area), asc(causes.name)),
    db
      .select({ causeId: causeParts.causeId, quantity: causeParts.quantity, slug: parts.slug, name: parts.name, sku: parts.sku, unitPriceCents: parts.unitPriceCents })
      .from(causeParts)
      .innerJoin(parts, eq(parts.id, causeParts.partId))
      .orderBy(asc(parts.name)),
  ]);
  const partsOf = new Map<number, CauseWithParts["parts"]>();
  for (const { causeId, ...part } of links) partsOf.set(causeId, [...(partsOf.get(causeId) ?? []), part]);
  return rows.map((c) => ({
    id: c.id, slug: c.slug, name: c.name, area: c.area, description: c.description, inspectMinutes: c.inspectMinutes,
    labourMinutes: c.labourMinutes, priceLowCents: c.priceLowCents, priceHighCents: c.priceHighCents, ratingNm: c.ratingNm,
    active: c.active, parts: partsOf.get(c.id) ?? [],
  }));
}

export async function causeBySlug(slug: string): Promise<CauseWithParts | null> {
  const [row] = await db.select().from(causes).where(eq(causes.slug, slug)).limit(1);
  if (!row) return null;
  const links = await db
    .select({ quantity: causeParts.quantity, slug: parts.slug, name: parts.name, sku: parts.sku, unitPriceCents: parts.unitPriceCents })
    .from(causeParts)
    .innerJoin(parts, eq(parts.id, causeParts.partId))
    .where(eq(causeParts.causeId, row.id))
    .orderBy(asc(parts.name));
  return { ...row, parts: links };
}

export function listParts() {
  return db.select({ slug: parts.slug, name: parts.name, sku: parts.sku, unitPriceCents: parts.unitPriceCents }).from(parts).orderBy(asc(parts.name));
}
export type PartRow = Awaited<ReturnType<typeof listParts>>[number];

export interface FamilyRow {
  id: number;
  slug: string;
  name: string;
  generation: string;
  years: string;
  notes: string;
  makerSlug: string;
  makerName: string;
}

export function listFamilies(): Promise<FamilyRow[]> {
  return db
    .select({
      id: motorFamilies.id, slug: motorFamilies.slug, name: motorFamilies.name, generation: motorFamilies.generation,
      years: motorFamilies.years, notes: motorFamilies.notes, makerSlug: motorMakers.slug, makerName: motorMakers.name,
    })
    .from(motorFamilies)
    .innerJoin(motorMakers, eq(motorMakers.id, motorFamilies.makerId))
    .orderBy(asc(motorMakers.name), asc(motorFamilies.name), asc(motorFamilies.generation));
}

export function listMakers() {
  return db.select().from(motorMakers).orderBy(asc(motorMakers.name));
}
