import "server-only";
import { and, asc, desc, eq, gte, ilike, lt, or, sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { cases, motorFamilies, users } from "@/db/schema";
import type { CaseListPage, CaseSort } from "./cases-key";
import { loadWarrantyMonths, warrantyRepairOf } from "@/lib/survival/warranty";
import type { CaseListQuery } from "./list-query";

const likely = sql<string | null>`(select k.name from jsonb_each_text(${cases.finalRanking}) r join causes k on k.slug = r.key
  where r.key <> 'unlisted' order by r.value::float8 desc limit 1)`;
const likelyP = sql<number | null>`(select max(r.value::float8) from jsonb_each_text(${cases.finalRanking}) r where r.key <> 'unlisted')`;

const SORT_COLUMN: Record<CaseSort, SQL> = {
  createdAt: sql`${cases.createdAt}`,
  reference: sql`${cases.reference}`,
  // Lifecycle order, not alphabetical.
  status: sql`array_position(array['open', 'advised', 'booked_in', 'on_bench', 'closed'], ${cases.status})`,
  callerName: sql`lower(${cases.callerName})`,
  family: sql`${motorFamilies.name} || ' ' || ${motorFamilies.generation}`,
  symptom: sql`${cases.symptom}`,
  technician: sql`${users.name}`,
};

function escapeLike(value: string): string {
  return value.replace(/[\\%_]/g, (ch) => `\\${ch}`);
}

/** One page of cases for the table: filters, sort and pagination all in SQL. */
export async function listCases(query: CaseListQuery): Promise<CaseListPage> {
  const filters: SQL[] = [];
  if (query.status) filters.push(eq(cases.status, query.status));
  if (query.family) filters.push(eq(cases.familyId, query.family));
  if (query.symptom) filters.push(eq(cases.symptom, query.symptom));
  if (query.technician) filters.push(eq(cases.technicianId, query.technician));
  if (query.from) filters.push(gte(cases.createdAt, new Date(`${query.from}T00:00:00Z`)));
  if (query.to) filters.push(lt(cases.createdAt, new Date(new Date(`${query.to}T00:00:00Z`).getTime() + 86_400_000)));
  if (query.q) {
    const like = `%${escapeLike(query.q)}%`;
    filters.push(or(ilike(cases.reference, like), ilike(cases.callerName, like), ilike(cases.serial, like))!);
  }
  const where = filters.length ? and(...filters) : undefined;
  const order = query.dir === "asc" ? asc : desc;

  const warrantyMonths = await loadWarrantyMonths();
  const [rows, [{ total }]] = await Promise.all([
    db.select({
      id: cases.id, reference: cases.reference, status: cases.status, callerName: cases.callerName, callerKind: cases.callerKind,
      familyName: sql<string>`${motorFamilies.name} || ' ' || ${motorFamilies.generation}`, symptom: cases.symptom,
      technicianName: users.name, likelyCause: likely, likelyProbability: likelyP, createdAt: cases.createdAt, triagedAt: cases.triagedAt,
      warrantyOf: warrantyRepairOf(warrantyMonths),
    })
      .from(cases)
      .innerJoin(motorFamilies, eq(motorFamilies.id, cases.familyId))
      .leftJoin(users, eq(users.id, cases.technicianId))
      .where(where)
      .orderBy(order(SORT_COLUMN[query.sort]), order(cases.id))
      .limit(query.limit)
      .offset((query.page - 1) * query.limit),
    db.select({ total: sql<number>`count(*)::int` }).from(cases).where(where),
  ]);
  return {
    rows: rows.map((r) => ({
      ...r,
      likelyProbability: r.likelyProbability === null ? null : Number(r.likelyProbability),
      createdAt: r.createdAt.toISOString(),
      triagedAt: r.triagedAt ? r.triagedAt.toISOString() : null,
    })),
    total,
    page: query.page,
    limit: query.limit,
  };
}
