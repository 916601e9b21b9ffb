import type { Tx } from "@/db";
import { causeParts, causes, motorFamilies, motorMakers, parts } from "@/db/schema";
import type { Content } from "@/db/seed/content";

const cents = (eur: number) => Math.round(eur * 100);

/** Makers, families, parts and causes from content/catalogue. Returns slug → id maps. */
export async function seedCatalogue(tx: Tx, content: Content) {
  const makerRows = await tx
    .insert(motorMakers)
    .values(content.makers.map((m) => ({ slug: m.slug, name: m.name, blurb: m.blurb })))
    .returning({ id: motorMakers.id, slug: motorMakers.slug });
  const makerId = new Map(makerRows.map((r) => [r.slug, r.id]));
  const familyRows = await tx
    .insert(motorFamilies)
    .values(content.families.map((f) => ({
      makerId: makerId.get(f.maker)!, slug: f.slug, name: f.name, generation: f.generation, years: f.years, notes: f.notes,
    })))
    .returning({ id: motorFamilies.id, slug: motorFamilies.slug });
  const partRows = await tx
    .insert(parts)
    .values(content.parts.map((p) => ({ slug: p.slug, name: p.name, sku: p.sku, unitPriceCents: cents(p.unitPriceEur) })))
    .returning({ id: parts.id, slug: parts.slug });
  const partId = new Map(partRows.map((r) => [r.slug, r.id]));
  const causeRows = await tx
    .insert(causes)
    .values(content.causes.map((c) => ({
      slug: c.slug, name: c.name, area: c.area, description: c.description, inspectMinutes: Math.round(c.inspectMinutes),
      labourMinutes: Math.round(c.labourMinutes), priceLowCents: cents(c.priceLowEur), priceHighCents: cents(c.priceHighEur),
      ratingNm: c.ratingNm ?? null,
    })))
    .returning({ id: causes.id, slug: causes.slug });
  const causeId = new Map(causeRows.map((r) => [r.slug, r.id]));
  const links = content.causes.flatMap((c) => c.parts.map((p) => ({ causeId: causeId.get(c.slug)!, partId: partId.get(p.part)!, quantity: p.quantity })));
  if (links.length) await tx.insert(causeParts).values(links);
  return {
    familyId: new Map(familyRows.map((r) => [r.slug, r.id])),
    partId,
    causeId,
  };
}
