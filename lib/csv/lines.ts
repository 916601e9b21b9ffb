import Papa from "papaparse";

export interface CsvRecord {
  /** 1-based line of the file where the record starts (a quoted field may run over several lines). */
  line: number;
  cells: string[];
}

export const BOM = "\uFEFF";

/** Line endings made uniform (a file edited on two systems can mix them) and the byte-order mark dropped. */
export function normaliseText(text: string): string {
  return (text.startsWith(BOM) ? text.slice(1) : text).replace(/\r\n?/g, "\n");
}

/**
 * Splits CSV text into records with the line each starts on, skipping blank lines. Quoting follows
 * RFC 4180 (papaparse); the delimiter is detected (comma or semicolon, as spreadsheets save them).
 */
export function readCsv(text: string): { records: CsvRecord[]; errors: { line: number; message: string }[] } {
  const clean = normaliseText(text);
  const newlines: number[] = [];
  for (let i = clean.indexOf("\n"); i !== -1; i = clean.indexOf("\n", i + 1)) newlines.push(i);
  const lineAt = (offset: number) => {
    let lo = 0;
    let hi = newlines.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (newlines[mid] < offset) lo = mid + 1;
      else hi = mid;
    }
    return lo + 1;
  };
  const records: CsvRecord[] = [];
  const errors: { line: number; message: string }[] = [];
  let previousEnd = 0;
  Papa.parse<string[]>(clean, {
    delimitersToGuess: [",", ";", "\t"],
    skipEmptyLines: "greedy",
    step: (result) => {
      let start = previousEnd;
      while (start < clean.length && /\s/.test(clean[start])) start++;
      const line = lineAt(start);
      previousEnd = result.meta.cursor;
      for (const e of result.errors) errors.push({ line, message: e.message });
      records.push({ line, cells: result.data });
    },
  });
  return { records, errors };
}
