import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import { db, type Tx } from "@/db";
import { caseEvents, caseOutcomes, cases, causes, motorFamilies, outcomeCauses, outcomeParts, parts, trees, treeVersions } from "@/db/schema";
import type { SessionUser } from "@/lib/auth/session-user";
import { AppError, pgErrorCode } from "@/lib/errors";
import { storeOutcomeCopies } from "@/lib/outcomes/outcome-copies";
import { REPEAT_WINDOW_DAYS } from "@/lib/outcomes/repeat";
import { fileDigest } from "./import-token";
import { readCsv } from "./lines";
import { checkImport, referencesIn, type ImportCatalogue, type ImportCheck, type ImportRow } from "./validate";

/** A past-repairs file is read whole; beyond this it should be split. */
export const IMPORT_MAX_BYTES = 2 * 1024 * 1024;
/** Marks imported records in case_events; they have no triage steps, so accuracy and learning skip them. */
export const IMPORTED_EVENT = "imported";

async function catalogueFor(references: string[], autoReference: (line: number) => string, conn: typeof db | Tx = db): Promise<ImportCatalogue> {
  const [familyRows, causeRows, partRows, versionRows, taken] = await Promise.all([
    conn.select({ id: motorFamilies.id, slug: motorFamilies.slug, name: motorFamilies.name, generation: motorFamilies.generation }).from(motorFamilies),
    conn.select({ id: causes.id, slug: causes.slug, name: causes.name }).from(causes),
    conn.select({ id: parts.id, slug: parts.slug }).from(parts),
    conn.select({ versionId: treeVersions.id, number: treeVersions.number, slug: trees.slug, symptom: trees.symptom, title: trees.title })
      .from(treeVersions).innerJoin(trees, eq(trees.id, treeVersions.treeId))
      .where(and(eq(treeVersions.state, "published"), eq(trees.archived, false))),
    references.length ? conn.select({ reference: cases.reference }).from(cases).where(inArray(cases.reference, references)) : Promise.resolve([]),
  ]);
  const latest = new Map<string, (typeof versionRows)[number]>();
  for (const v of versionRows) if ((latest.get(v.slug)?.number ?? 0) < v.number) latest.set(v.slug, v);
  return {
    families: familyRows.map((f) => ({ id: f.id, slug: f.slug, name: f.generation ? `${f.name} ${f.generation}` : f.name })),
    causes: causeRows,
    parts: partRows,
    trees: [...latest.values()].map((v) => ({ versionId: v.versionId, slug: v.slug, symptom: v.symptom, title: v.title })),
    takenReferences: new Set(taken.map((t) => t.reference)),
    today: new Date(),
    autoReference,
  };
}

export function decodeCsv(bytes: Uint8Array): string {
  if (bytes.byteLength > IMPORT_MAX_BYTES) throw new AppError("too_large", `The file is larger than ${IMPORT_MAX_BYTES / 1024 / 1024} MB; split it and import the parts one after the other.`);
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new AppError("unsupported", "The file is not UTF-8 text. Save it from the spreadsheet as “CSV UTF-8” and try again.");
  }
}

/** Reads and checks a file without writing anything: what the preview shows. */
export async function checkImportFile(bytes: Uint8Array): Promise<ImportCheck> {
  const { records, errors } = readCsv(decodeCsv(bytes));
  const digest = fileDigest(bytes).slice(0, 8).toUpperCase();
  const autoReference = (line: number) => `IMP-${digest}-${line}`;
  const check = checkImport(records, await catalogueFor(referencesIn(records, autoReference), autoReference));
  if (errors.length) {
    // A quoting error makes the rest of its record unreliable: report it and skip that row.
    for (const e of errors) check.problems.push({ line: e.line, column: "", message: `The CSV could not be read here: ${e.message}.` });
    for (const line of new Set(errors.map((e) => e.line))) {
      const at = check.rows.findIndex((r) => r.line === line);
      if (at !== -1) { check.rows.splice(at, 1); check.skipped++; }
    }
    check.problems.sort((a, b) => a.line - b.line);
  }
  return check;
}

function chunks<T>(items: T[], size: number): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += size) out.push(items.slice(i, i + size));
  return out;
}

/** Inserts checked rows as closed cases with their outcomes, all in the caller's transaction. */
export async function insertImportedRows(tx: Tx, rows: ImportRow[], user: SessionUser, fileName: string): Promise<number[]> {
  const now = new Date();
  const ids: number[] = [];
  for (const group of chunks(rows, 500)) {
    const inserted = await tx.insert(cases).values(group.map((r) => {
      // Noon UTC keeps the day the same in every European and American time zone.
      const at = new Date(`${r.closedOn}T12:00:00Z`);
      return {
        reference: r.reference,
        status: "closed" as const, callerName: "Imported record", callerKind: r.callerKind, familyId: r.familyId, serial: r.serial,
        ridingUse: r.ridingUse, symptom: r.symptom, treeVersionId: r.treeVersionId, createdAt: at, updatedAt: now, closedAt: at,
      };
    })).returning({ id: cases.id });
    ids.push(...inserted.map((c) => c.id));
  }
  const withIds = rows.map((r, i) => ({ r, id: ids[i] }));
  for (const group of chunks(withIds, 1000)) {
    await tx.insert(caseOutcomes).values(group.map(({ r, id }) => ({ caseId: id, labourMinutes: r.labourMinutes, notes: r.notes, recordedBy: user.id, recordedAt: now })));
    await tx.insert(outcomeCauses).values(group.map(({ r, id }) => ({ caseId: id, causeId: r.causeId, primary: true })));
    const partRows = group.flatMap(({ r, id }) => r.parts.map((p) => ({ caseId: id, ...p })));
    if (partRows.length) await tx.insert(outcomeParts).values(partRows);
    await storeOutcomeCopies(tx, group.map(({ id }) => id));
    await tx.insert(caseEvents).values(group.map(({ r, id }) => ({
      caseId: id, kind: IMPORTED_EVENT, toStatus: "closed", byUserId: user.id, note: `Imported from ${fileName.slice(0, 120)}, line ${r.line}`, at: now,
    })));
  }
  // Repeat returns among the imported records and between them and cases already here.
  await tx.execute(sql`
    update cases c set repeat_of_case_id = m.earlier
    from (
      select x.id, (
        select e.id from cases e
        where e.family_id = x.family_id and e.serial = x.serial and e.id <> x.id
          and e.created_at < x.created_at and e.created_at >= x.created_at - make_interval(days => ${REPEAT_WINDOW_DAYS})
        order by e.created_at desc limit 1) as earlier
      from cases x
      where x.serial <> '' and (x.family_id, x.serial) in (
        select family_id, serial from cases where id in (${sql.join(ids.map((i) => sql`${i}`), sql`, `)}) and serial <> '')
    ) m
    where c.id = m.id and c.repeat_of_case_id is distinct from m.earlier`);
  return ids;
}

/** Re-checks the file and imports exactly the rows the user confirmed, in one transaction. */
export async function runImport(bytes: Uint8Array, fileName: string, user: SessionUser, confirmed: { valid: number; skipped: number }): Promise<{ imported: number; skipped: number; caseIds: number[] }> {
  const check = await checkImportFile(bytes);
  if (check.rows.length !== confirmed.valid || check.skipped !== confirmed.skipped) {
    throw new AppError("conflict", `Checked again, the file now has ${check.rows.length} valid rows and ${check.skipped} to skip (the catalogue or the cases changed). Nothing was imported; check the file again.`);
  }
  if (check.rows.length === 0) throw new AppError("invalid", "No valid rows to import.");
  try {
    const caseIds = await db.transaction((tx) => insertImportedRows(tx, check.rows, user, fileName));
    return { imported: caseIds.length, skipped: check.skipped, caseIds };
  } catch (error) {
    if (pgErrorCode(error) === "23505") throw new AppError("conflict", "A reference in the file was taken by another case a moment ago. Nothing was imported; check the file again.");
    throw error;
  }
}
