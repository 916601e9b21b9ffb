import "server-only";
import { eq, sql } from "drizzle-orm";
import { z } from "zod";
import { db, type Db, type Tx } from "@/db";
import { cases, settings } from "@/db/schema";

/** The shop's warranty on a repair, in months from its closing (settings table, key "warranty"). */
export const WARRANTY_SETTINGS_KEY = "warranty";
export const DEFAULT_WARRANTY_MONTHS = 6;
export const warrantySettingsSchema = z.object({ months: z.number().int().min(1).max(60) });

export async function loadWarrantyMonths(conn: Db | Tx = db): Promise<number> {
  const [row] = await conn.select({ value: settings.value }).from(settings).where(eq(settings.key, WARRANTY_SETTINGS_KEY)).limit(1);
  const parsed = warrantySettingsSchema.safeParse(row?.value);
  return parsed.success ? parsed.data.months : DEFAULT_WARRANTY_MONTHS;
}

/**
 * The reference of the repair a case comes back under warranty from, in SQL, for a `cases` row:
 * the latest closed case of the same motor family and serial closed before this case was opened,
 * no more than the warranty period earlier. Null when none (or no serial). One index probe per row.
 */
export function warrantyRepairOf(months: number) {
  return sql<string | null>`(select p.reference from cases p
    where ${cases.serial} <> '' and p.serial = ${cases.serial} and p.family_id = ${cases.familyId} and p.id <> ${cases.id}
      and p.status = 'closed' and p.closed_at < ${cases.createdAt}
      and p.closed_at >= ${cases.createdAt} - make_interval(months => ${months})
    order by p.closed_at desc limit 1)`;
}

export interface WarrantyReturn {
  repairId: number;
  repairReference: string;
  repairClosedAt: Date;
  days: number;
  months: number;
}

/** For the case page: the repair this case returns under warranty from, or null. */
export async function warrantyReturnOf(caseId: number, conn: Db | Tx = db): Promise<WarrantyReturn | null> {
  const months = await loadWarrantyMonths(conn);
  const rows = await conn.execute<{ id: number; reference: string; closed_at: string; days: number }>(sql`
    select p.id, p.reference, p.closed_at, floor(extract(epoch from c.created_at - p.closed_at) / 86400)::int as days
    from cases c join cases p on p.serial = c.serial and p.family_id = c.family_id and p.id <> c.id
    where c.id = ${caseId} and c.serial <> '' and p.status = 'closed' and p.closed_at < c.created_at
      and p.closed_at >= c.created_at - make_interval(months => ${months})
    order by p.closed_at desc limit 1`);
  const r = rows[0];
  return r ? { repairId: r.id, repairReference: r.reference, repairClosedAt: new Date(r.closed_at), days: r.days, months } : null;
}
