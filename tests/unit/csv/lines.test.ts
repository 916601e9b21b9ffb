import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { readCsv } from "@/lib/csv/lines";

describe("reading CSV records with their line numbers", () => {
  it("counts lines through quoted line breaks, blank lines, CRLF and a byte-order mark", () => {
    const text = "\uFEFFdate,notes\r\n2025-01-02,plain\r\n\r\n2025-01-03,\"two\r\nlines, and a \"\"quote\"\"\"\r\n2025-01-04,last\n";
    const { records, errors } = readCsv(text);
    expect(errors).toEqual([]);
    expect(records.map((r) => [r.line, r.cells])).toEqual([
      [1, ["date", "notes"]],
      [2, ["2025-01-02", "plain"]],
      [4, ["2025-01-03", "two\nlines, and a \"quote\""]],
      [6, ["2025-01-04", "last"]],
    ]);
  });

  it("reads what papaparse's unparse writes (semicolons too, as some spreadsheets save)", () => {
    const rows = [["a", "b;c", "x\"y"], ["1", "", "=2"]];
    expect(readCsv(Papa.unparse(rows)).records.map((r) => r.cells)).toEqual(rows);
    expect(readCsv("a;b\n1;2\n").records.map((r) => r.cells)).toEqual([["a", "b"], ["1", "2"]]);
  });

  it("reports a broken quote with its line", () => {
    const { errors } = readCsv("a,b\n1,\"open\n2,3\n");
    expect(errors.length).toBeGreaterThan(0);
    expect(errors[0].line).toBe(2);
  });
});
