import Papa from "papaparse";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { caseOutcomes } from "@/db/schema";
import { GET as exportCases } from "@/app/api/exports/cases/route";
import { EXPORT_COLUMNS } from "@/lib/csv/export";
import { createRoleUsers } from "../../support/db";
import { params, request } from "../../support/requests";
import { resetToDemo } from "../../support/seed";
import { day, demoIds, insertCases, times } from "../reports/fixtures";

describe("CSV export of closed cases with outcomes", () => {
  let users: Awaited<ReturnType<typeof createRoleUsers>>;
  let tricky: number;

  beforeAll(async () => {
    await resetToDemo();
    users = await createRoleUsers();
    const ids = await demoIds();
    [tricky] = await insertCases(ids, [
      { family: "orvanta-tessel-2", tree: "pedal-slip", closedAt: day("2025-03-03"), primary: "owc-cage-broken", secondary: ["belt-worn"], parts: [{ slug: "owc-uprated", quantity: 1 }, { slug: "gear-grease", quantity: 2 }], serial: "SER-9" },
      // 1,200 more, so the export runs over several batches.
      ...times(1200, { family: "haldrin-carrow-1", tree: "weak-assist", closedAt: day("2025-04-04"), primary: "torque-sensor-drift" }),
      { family: "orvanta-tessel-2", tree: "pedal-slip", status: "on_bench", createdAt: day("2025-03-01"), primary: "owc-cage-broken" },
      { family: "orvanta-tessel-2", tree: "pedal-slip", closedAt: day("2024-06-01"), primary: "owc-cage-broken" },
    ]);
    await db.update(caseOutcomes).set({ notes: "=HYPERLINK(\"x\"), then \"quoted\",\nand a second line — Zähne", labourMinutes: 95 }).where(eq(caseOutcomes.caseId, tricky));
  });

  async function exported(query: string, token = users.lead.token) {
    const response = await exportCases(request(`/api/exports/cases?${query}`, { token }), params({}));
    const bytes = new Uint8Array(await response.arrayBuffer());
    // ignoreBOM keeps the byte-order mark in the text, where Response.text() would drop it.
    return { response, bytes, text: new TextDecoder("utf-8", { ignoreBOM: true }).decode(bytes) };
  }

  it("is UTF-8 with a byte-order mark, quoted so that spreadsheets read every cell back", async () => {
    const { response, bytes, text } = await exported("from=2025-01-01&to=2025-12-31");
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    expect(response.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(response.headers.get("content-disposition")).toBe("attachment; filename=\"rootbench-cases-2025-01-01-to-2025-12-31.csv\"");
    expect(text.startsWith("\uFEFF")).toBe(true);
    const parsed = Papa.parse<string[]>(text.slice(1), { skipEmptyLines: true }).data;
    expect(parsed[0]).toEqual([...EXPORT_COLUMNS]);
    // Closed in the period only: 1 + 1,200 (the on-bench case and the 2024 one are left out).
    expect(parsed.length - 1).toBe(1201);
    const row = Object.fromEntries(parsed[0].map((h, i) => [h, parsed[1][i]]));
    expect(row).toMatchObject({
      date: "2025-03-03", family: "orvanta-tessel-2", serial: "SER-9", cause: "owc-cage-broken", other_causes: "belt-worn",
      parts: "gear-grease:2;owc-uprated:1", labour_minutes: "95", tree: "pedal-slip", tree_version: "1", triaged_on_tree: "yes",
      // A cell a spreadsheet would run as a formula starts with an apostrophe (OWASP's advice on CSV injection).
      notes: "'=HYPERLINK(\"x\"), then \"quoted\",\nand a second line — Zähne",
    });
  });

  it("has no formula cell when a spreadsheet splits it at commas, semicolons or tabs", async () => {
    // Notes written to be split apart: each piece after a separator starts like a formula.
    const hostile = ["x;=cmd|' /C calc'!A0", "a,@SUM(1+1)", "tab\t+1+2", "b; -3+4", "c;\"=HYPERLINK(\"x\")", "line\n=1+1", "d;\t@x", " =lead"];
    const [first] = await insertCases(await demoIds(), [{ family: "orvanta-tessel-2", tree: "pedal-slip", closedAt: day("2023-05-05"), primary: "owc-cage-broken", serial: "-S1;=2" }]);
    await db.update(caseOutcomes).set({ notes: hostile.join(" | ") }).where(eq(caseOutcomes.caseId, first));
    const { text } = await exported("from=2023-05-01&to=2023-05-31");
    // A spreadsheet starts a formula with = + - @ (OWASP, "CSV Injection"); some skip leading spaces and quotes first.
    const formulaLike = /^[\s"]*[=+\-@]/;
    for (const delimiter of [",", ";", "\t"]) {
      const cells = Papa.parse<string[]>(text.slice(1), { delimiter, skipEmptyLines: true }).data.flat();
      expect(cells.length, delimiter).toBeGreaterThan(1);
      expect(cells.filter((c) => formulaLike.test(c)), `parsed with ${JSON.stringify(delimiter)}`).toEqual([]);
    }
  });

  it("follows the family filter and refuses roles without export", async () => {
    const { text } = await exported("from=2025-01-01&to=2025-12-31&family=orvanta-tessel-2");
    expect(Papa.parse(text.slice(1), { skipEmptyLines: true }).data).toHaveLength(2);
    const { response } = await exported("last=12", users.senior.token);
    expect(response.status).toBe(403);
  });
});
