import "server-only";
import { inArray } from "drizzle-orm";
import { db, type Db, type Tx } from "@/db";
import { causes, type CauseArea } from "@/db/schema";
import type { QuoteCause } from "./quote";

export interface CaseCause extends QuoteCause {
  area: CauseArea;
  description: string;
}

/** Catalogue rows for the given cause slugs: names, areas, price bands and minutes. */
export async function causesBySlug(slugs: string[], conn: Db | Tx = db): Promise<Map<string, CaseCause>> {
  if (slugs.length === 0) return new Map();
  const rows = await conn.select({
    slug: causes.slug, name: causes.name, area: causes.area, description: causes.description,
    priceLowCents: causes.priceLowCents, priceHighCents: causes.priceHighCents,
    labourMinutes: causes.labourMinutes, inspectMinutes: causes.inspectMinutes,
  }).from(causes).where(inArray(causes.slug, slugs));
  return new Map(rows.map((r) => [r.slug, r]));
}
