import { describe, expect, it } from "vitest";
import { readCsv } from "@/lib/csv/lines";
import { checkImport, referencesIn, type ImportCatalogue } from "@/lib/csv/validate";

const catalogue: ImportCatalogue = {
  families: [{ id: 1, slug: "orvanta-tessel-2", name: "Orvanta Tessel Gen 2" }],
  causes: [{ id: 7, slug: "owc-cage-broken", name: "One-way clutch cage broken" }],
  parts: [{ id: 3, slug: "owc-uprated" }, { id: 4, slug: "gear-grease" }],
  trees: [{ versionId: 11, slug: "pedal-slip", symptom: "Pedals slip", title: "Pedal slip" }],
  takenReferences: new Set(["JOB-1"]),
  today: new Date("2026-01-15T10:00:00Z"),
  autoReference: (line) => `IMP-TEST-${line}`,
};
const header = "Date,Reference,Family,Serial,Riding use,Symptom,Cause,Parts,Labour minutes,Notes,Colour";

describe("checking a past-repairs file", () => {
  it("takes names or slugs, any header spelling, and fills in what may be left empty", () => {
    const csv = `${header}\n2025-03-14,,Orvanta  tessel gen 2,S1,Trail,pedals slip,One-way clutch cage broken,owc-uprated:1;gear-grease,95,ok,red\n`;
    const check = checkImport(readCsv(csv).records, catalogue);
    expect(check.problems).toEqual([]);
    expect(check.unusedColumns).toEqual(["Colour"]);
    expect(check.rows).toEqual([{
      line: 2, closedOn: "2025-03-14", reference: "IMP-TEST-2", familyId: 1, serial: "S1", ridingUse: "trail", callerKind: "rider",
      treeVersionId: 11, symptom: "Pedals slip", causeId: 7, parts: [{ partId: 3, quantity: 1 }, { partId: 4, quantity: 1 }], labourMinutes: 95, notes: "ok",
    }]);
  });

  it("names the line, the column and why, for every problem of a row", () => {
    const csv = [
      header,
      "2025-02-30,JOB-1,unknown-family,,boat,pedal-slip,owc-cage-broken,owc-uprated:0;nope:2,ninety,,",
      "2025-03-01,JOB-2,orvanta-tessel-2,,road,pedal-slip,owc-cage-broken,,,,",
      "2025-03-02,JOB-2,orvanta-tessel-2,,road,pedal-slip,owc-cage-broken,,,,",
      "2027-01-01,JOB-3,orvanta-tessel-2,,road,pedal-slip,owc-cage-broken,,,,",
    ].join("\n");
    const check = checkImport(readCsv(csv).records, catalogue);
    expect(check.total).toBe(4);
    expect(check.skipped).toBe(3);
    expect(check.rows.map((r) => r.reference)).toEqual(["JOB-2"]);
    expect(check.problems.map((p) => [p.line, p.column])).toEqual([
      [2, "date"], [2, "reference"], [2, "family"], [2, "riding_use"], [2, "parts"], [2, "parts"], [2, "labour_minutes"],
      [4, "reference"], [5, "date"],
    ]);
    expect(check.problems[0].message).toBe("\"2025-02-30\" is not a date written as YYYY-MM-DD.");
    expect(check.problems[7].message).toBe("\"JOB-2\" is used on line 3 already.");
    expect(check.problems[8].message).toBe("2027-01-01 is in the future.");
  });

  it("a missing required column refuses the whole file", () => {
    const check = checkImport(readCsv("date,family\n2025-01-01,orvanta-tessel-2\n").records, catalogue);
    expect(check.rows).toEqual([]);
    expect(check.problems.map((p) => p.column)).toEqual(["riding_use", "symptom", "cause"]);
  });

  it("lists the references rows would get, so taken ones can be looked up", () => {
    const records = readCsv(`${header}\n2025-01-01,,x\n2025-01-01,JOB-9,x\n`).records;
    expect(referencesIn(records, (line) => `IMP-${line}`)).toEqual(["IMP-2", "JOB-9"]);
  });
});
