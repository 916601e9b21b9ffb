import { CALLER_KINDS, RIDING_USES } from "@/db/schema";
import { headerKey, IMPORT_COLUMNS } from "./columns";
import type { CsvRecord } from "./lines";

export const IMPORT_LIMITS = { rows: 5000, reference: 40, serial: 60, notes: 4000, labourMinutes: 6000, quantity: 99, parts: 30 } as const;

export interface ImportCatalogue {
  families: { id: number; slug: string; name: string }[];
  causes: { id: number; slug: string; name: string }[];
  parts: { id: number; slug: string }[];
  /** Trees with a published version: the version new records are filed under. */
  trees: { versionId: number; slug: string; symptom: string; title: string }[];
  /** References already taken in the database (of those the file uses). */
  takenReferences: ReadonlySet<string>;
  today: Date;
  /** The reference a row without one gets; derived from the file, so importing it twice collides. */
  autoReference: (line: number) => string;
}

export interface ImportRow {
  line: number;
  closedOn: string;
  reference: string;
  familyId: number;
  serial: string;
  ridingUse: (typeof RIDING_USES)[number];
  callerKind: (typeof CALLER_KINDS)[number];
  treeVersionId: number;
  symptom: string;
  causeId: number;
  parts: { partId: number; quantity: number }[];
  labourMinutes: number;
  notes: string;
}

export interface RowProblem {
  line: number;
  /** The column as the documented name; "" for the file or the row as a whole. */
  column: string;
  message: string;
}

export interface ImportCheck {
  rows: ImportRow[];
  problems: RowProblem[];
  /** Data records in the file (header excluded). */
  total: number;
  /** Lines with at least one problem: the rows an import would skip. */
  skipped: number;
  unusedColumns: string[];
}

const squash = (s: string) => s.trim().toLowerCase().replace(/\s+/g, " ");

function lookup<T>(items: T[], keys: (item: T) => string[]): Map<string, T> {
  const map = new Map<string, T>();
  for (const item of items) for (const k of keys(item)) if (!map.has(squash(k))) map.set(squash(k), item);
  return map;
}

/** The references the file's rows would get, so the caller can ask the database which are taken. */
export function referencesIn(records: CsvRecord[], autoReference: (line: number) => string): string[] {
  const header = records[0]?.cells.map(headerKey) ?? [];
  const at = header.indexOf("reference");
  return [...new Set(records.slice(1).map((r) => (at === -1 ? "" : (r.cells[at] ?? "").trim()) || autoReference(r.line)))];
}

/**
 * Checks every row of a past-repairs file against the documented columns and the catalogue, and
 * says for each problem the line, the column and why. Rows without problems are ready to insert.
 */
export function checkImport(records: CsvRecord[], catalogue: ImportCatalogue): ImportCheck {
  const problems: RowProblem[] = [];
  if (records.length === 0) return { rows: [], problems: [{ line: 1, column: "", message: "The file is empty." }], total: 0, skipped: 0, unusedColumns: [] };
  const [head, ...data] = records;
  const header = head.cells.map(headerKey);
  const index = new Map<string, number>();
  header.forEach((h, i) => { if (!index.has(h)) index.set(h, i); });
  const known = new Set(IMPORT_COLUMNS.map((c) => c.name));
  const unusedColumns = head.cells.filter((_, i) => !known.has(header[i])).map((h) => h.trim()).filter(Boolean);
  const missing = IMPORT_COLUMNS.filter((c) => c.required && !index.has(c.name));
  if (missing.length) {
    for (const c of missing) problems.push({ line: head.line, column: c.name, message: `The header has no "${c.name}" column, which every row needs.` });
    return { rows: [], problems, total: data.length, skipped: data.length, unusedColumns };
  }
  if (data.length > IMPORT_LIMITS.rows) {
    problems.push({ line: head.line, column: "", message: `The file has ${data.length} rows; import at most ${IMPORT_LIMITS.rows} at a time.` });
    return { rows: [], problems, total: data.length, skipped: data.length, unusedColumns };
  }

  const families = lookup(catalogue.families, (f) => [f.slug, f.name]);
  const causes = lookup(catalogue.causes, (c) => [c.slug, c.name]);
  const parts = new Map(catalogue.parts.map((p) => [p.slug.toLowerCase(), p]));
  const trees = lookup(catalogue.trees, (t) => [t.slug, t.symptom, t.title]);
  const todayDay = catalogue.today.toISOString().slice(0, 10);
  const seenReferences = new Map<string, number>();
  const rows: ImportRow[] = [];
  let skipped = 0;

  for (const record of data) {
    const found: RowProblem[] = [];
    const issue = (column: string, message: string) => found.push({ line: record.line, column, message });
    const cell = (name: string) => {
      const i = index.get(name);
      return i === undefined ? "" : (record.cells[i] ?? "").trim();
    };
    if (record.cells.length !== head.cells.length) {
      issue("", `The row has ${record.cells.length} cells but the header has ${head.cells.length}; a separator or quote may be missing.`);
    }

    const date = cell("date");
    const day = /^\d{4}-\d{2}-\d{2}$/.test(date) ? new Date(`${date}T00:00:00Z`) : null;
    if (!date) issue("date", "Empty; give the day the repair was finished as YYYY-MM-DD.");
    else if (!day || Number.isNaN(day.getTime()) || day.toISOString().slice(0, 10) !== date) issue("date", `"${date}" is not a date written as YYYY-MM-DD.`);
    else if (date > todayDay) issue("date", `${date} is in the future.`);

    const reference = cell("reference") || catalogue.autoReference(record.line);
    if (reference.length > IMPORT_LIMITS.reference) issue("reference", `Longer than ${IMPORT_LIMITS.reference} characters.`);
    else if (seenReferences.has(reference)) issue("reference", `"${reference}" is used on line ${seenReferences.get(reference)} already.`);
    else if (catalogue.takenReferences.has(reference)) {
      issue("reference", cell("reference") ? `A case "${reference}" exists already.` : `This row was imported already (as ${reference}).`);
    }
    if (!seenReferences.has(reference)) seenReferences.set(reference, record.line);

    const familyText = cell("family");
    const family = familyText ? families.get(squash(familyText)) : undefined;
    if (!familyText) issue("family", "Empty; name the motor family.");
    else if (!family) issue("family", `"${familyText}" is not a motor family in the catalogue.`);

    const serial = cell("serial");
    if (serial.length > IMPORT_LIMITS.serial) issue("serial", `Longer than ${IMPORT_LIMITS.serial} characters.`);

    const use = cell("riding_use").toLowerCase();
    if (!(RIDING_USES as readonly string[]).includes(use)) issue("riding_use", use ? `"${use}" is not one of ${RIDING_USES.join(", ")}.` : `Empty; use one of ${RIDING_USES.join(", ")}.`);

    const caller = cell("caller_kind").toLowerCase() || "rider";
    if (!(CALLER_KINDS as readonly string[]).includes(caller)) issue("caller_kind", `"${caller}" is not rider or dealer.`);

    const symptomText = cell("symptom");
    const tree = symptomText ? trees.get(squash(symptomText)) : undefined;
    if (!symptomText) issue("symptom", "Empty; name the reported symptom.");
    else if (!tree) issue("symptom", `"${symptomText}" matches no published tree (use a tree's slug, symptom or title).`);

    const causeText = cell("cause");
    const cause = causeText ? causes.get(squash(causeText)) : undefined;
    if (!causeText) issue("cause", "Empty; name the confirmed cause.");
    else if (!cause) issue("cause", `"${causeText}" is not a cause in the catalogue.`);

    const rowParts: ImportRow["parts"] = [];
    const partsText = cell("parts");
    for (const item of partsText ? partsText.split(";").map((s) => s.trim()).filter(Boolean) : []) {
      const [slug, qtyText, extra] = item.split(":").map((s) => s.trim());
      const part = parts.get((slug ?? "").toLowerCase());
      const quantity = qtyText === undefined || qtyText === "" ? 1 : Number(qtyText);
      if (extra !== undefined) issue("parts", `"${item}" should be written slug:quantity.`);
      else if (!part) issue("parts", `"${slug}" is not a part in the catalogue.`);
      else if (!Number.isInteger(quantity) || quantity < 1 || quantity > IMPORT_LIMITS.quantity) issue("parts", `The quantity in "${item}" must be a whole number from 1 to ${IMPORT_LIMITS.quantity}.`);
      else if (rowParts.some((p) => p.partId === part.id)) issue("parts", `"${slug}" is listed twice; add the quantities up.`);
      else rowParts.push({ partId: part.id, quantity });
    }
    if (rowParts.length > IMPORT_LIMITS.parts) issue("parts", `More than ${IMPORT_LIMITS.parts} different parts.`);

    const labourText = cell("labour_minutes");
    const labour = labourText === "" ? 0 : Number(labourText);
    if (!Number.isInteger(labour) || labour < 0 || labour > IMPORT_LIMITS.labourMinutes) {
      issue("labour_minutes", `"${labourText}" is not a whole number of minutes from 0 to ${IMPORT_LIMITS.labourMinutes}.`);
    }

    const notes = cell("notes");
    if (notes.length > IMPORT_LIMITS.notes) issue("notes", `Longer than ${IMPORT_LIMITS.notes} characters.`);

    if (found.length) {
      problems.push(...found);
      skipped++;
      continue;
    }
    rows.push({
      line: record.line, closedOn: date, reference, familyId: family!.id, serial,
      ridingUse: use as ImportRow["ridingUse"], callerKind: caller as ImportRow["callerKind"], treeVersionId: tree!.versionId,
      symptom: tree!.symptom, causeId: cause!.id, parts: rowParts, labourMinutes: labour, notes,
    });
  }
  return { rows, problems, total: data.length, skipped, unusedColumns };
}
