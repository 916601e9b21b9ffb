import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { caseEvents, cases, outcomeCauses, outcomeParts } from "@/db/schema";
import { POST as confirm } from "@/app/api/imports/route";
import { POST as preview } from "@/app/api/imports/preview/route";
import type { ImportPreview } from "@/lib/csv/preview";
import { causePareto } from "@/lib/reports/pareto";
import { treeAccuracy } from "@/lib/reports/accuracy";
import { parseReportFilter } from "@/lib/reports/period";
import { resolveScope } from "@/lib/reports/scope";
import { countRows, createRoleUsers } from "../../support/db";
import { casesDisagreeingWithOutcome } from "../../support/outcome-copies";
import { params, request } from "../../support/requests";
import { resetToDemo } from "../../support/seed";

const HEADER = "date,reference,family,serial,riding_use,symptom,cause,parts,labour_minutes,notes";
const BAD_LINES = new Map<number, [string, string]>(); // row index → [column, what is wrong]

/** 100 past repairs; rows 10, 50 and 77 each carry one mistake. Row 5's note runs over two lines. */
function pastRepairs(): string {
  const lines = [HEADER];
  for (let i = 0; i < 100; i++) {
    const month = String(1 + (i % 9)).padStart(2, "0");
    let date = `2025-${month}-${String(1 + (i % 28)).padStart(2, "0")}`;
    let cause = i % 2 ? "owc-cage-broken" : "One-way clutch rollers and ramps worn";
    let parts = i % 3 ? "owc-uprated:1" : "owc-uprated:1;gear-grease:2";
    const notes = i === 5 ? "\"Cage split,\nsee photo\"" : `Job ${i}`;
    if (i === 10) { date = "14/03/2025"; BAD_LINES.set(i, ["date", date]); }
    if (i === 50) { cause = "gremlins"; BAD_LINES.set(i, ["cause", cause]); }
    if (i === 77) { parts = "owc-uprated:two"; BAD_LINES.set(i, ["parts", parts]); }
    lines.push([date, `OLD-${1000 + i}`, "orvanta-tessel-2", `SER-${i}`, "trail", "pedal-slip", cause, parts, String(60 + i), notes].join(","));
  }
  return lines.join("\r\n") + "\r\n";
}

const fileForm = (text: string, extra: Record<string, string> = {}) => {
  const form = new FormData();
  form.set("file", new File([text], "old-jobs.csv", { type: "text/csv" }));
  for (const [k, v] of Object.entries(extra)) form.set(k, v);
  return form;
};

describe("importing past repair records from CSV", () => {
  let users: Awaited<ReturnType<typeof createRoleUsers>>;
  const csv = pastRepairs();
  let checked: ImportPreview;

  beforeAll(async () => {
    await resetToDemo();
    users = await createRoleUsers();
  });

  it("the preview lists each bad row's line, column and reason, and imports nothing", async () => {
    const response = await preview(request("/api/imports/preview", { method: "POST", token: users.lead.token, body: fileForm(csv) }), params({}));
    expect(response.status).toBe(200);
    checked = (await response.json()) as ImportPreview;
    expect(checked).toMatchObject({ total: 100, valid: 97, skipped: 3, problemCount: 3 });
    // Data row i sits on line i + 2 (header on line 1), one more from row 6 on: row 5's note has a line break.
    expect(checked.problems.map((p) => [p.line, p.column])).toEqual([[13, "date"], [53, "cause"], [80, "parts"]]);
    expect(checked.problems[0].message).toBe("\"14/03/2025\" is not a date written as YYYY-MM-DD.");
    expect(checked.problems[1].message).toBe("\"gremlins\" is not a cause in the catalogue.");
    expect(await countRows("cases")).toBe(0);
  });

  it("nothing is imported without the explicit confirmation of those counts", async () => {
    const noToken = await confirm(request("/api/imports", { method: "POST", token: users.lead.token, body: fileForm(csv, { valid: "97", skipped: "3" }) }), params({}));
    expect(noToken.status).toBe(400);
    const wrongCounts = await confirm(request("/api/imports", { method: "POST", token: users.lead.token, body: fileForm(csv, { token: checked.token!, valid: "100", skipped: "0" }) }), params({}));
    expect(wrongCounts.status).toBe(400);
    expect(((await wrongCounts.json()) as { error: string }).error).toBe("Confirm the import of 97 valid rows, skipping 3.");
    const otherFile = await confirm(request("/api/imports", { method: "POST", token: users.lead.token, body: fileForm(csv.replace("Job 7", "Job seven"), { token: checked.token!, valid: "97", skipped: "3" }) }), params({}));
    expect(otherFile.status).toBe(409);
    const otherUser = await confirm(request("/api/imports", { method: "POST", token: users.admin.token, body: fileForm(csv, { token: checked.token!, valid: "97", skipped: "3" }) }), params({}));
    expect(otherUser.status).toBe(400);
    expect(await countRows("cases")).toBe(0);
  });

  it("confirmed, exactly the 97 good rows arrive as closed cases, in one go", async () => {
    const response = await confirm(request("/api/imports", { method: "POST", token: users.lead.token, body: fileForm(csv, { token: checked.token!, valid: "97", skipped: "3" }) }), params({}));
    expect(response.status).toBe(201);
    expect(await response.json()).toEqual({ imported: 97, skipped: 3 });
    expect(await countRows("cases")).toBe(97);
    expect(await countRows("outcome_causes")).toBe(97);
    expect(await countRows("case_steps")).toBe(0);
    expect((await db.select().from(caseEvents).where(eq(caseEvents.kind, "imported"))).length).toBe(97);
    const refs = new Set((await db.select({ r: cases.reference }).from(cases)).map((c) => c.r));
    for (const i of BAD_LINES.keys()) expect(refs.has(`OLD-${1000 + i}`)).toBe(false);
    const [row] = await db.select().from(cases).where(eq(cases.reference, "OLD-1005"));
    expect(row).toMatchObject({ status: "closed", serial: "SER-5", ridingUse: "trail" });
    expect(row.closedAt!.toISOString()).toBe("2025-06-06T12:00:00.000Z");
    const parts = await db.select().from(outcomeParts).where(eq(outcomeParts.caseId, row.id));
    expect(parts.map((p) => p.quantity).sort()).toEqual([1]);
    const [primary] = await db.select().from(outcomeCauses).where(eq(outcomeCauses.caseId, row.id));
    expect(primary.primary).toBe(true);
    // The case rows carry copies of their causes and parts, as the bench form writes them.
    expect(row.primaryCauseId).toBe(primary.causeId);
    expect(row).toMatchObject({ partIds: [parts[0].partId], partQuantities: [1], fittedUpgrades: [] });
    const [twoParts] = await db.select().from(cases).where(eq(cases.reference, "OLD-1000"));
    expect(twoParts.partQuantities.sort()).toEqual([1, 2]);
    expect(await casesDisagreeingWithOutcome()).toEqual([]);
  });

  it("imported records count in the Pareto but not in tree accuracy (no triage on a tree)", async () => {
    const scope = await resolveScope(parseReportFilter({ from: "2025-01-01", to: "2025-12-31" }));
    expect((await causePareto(scope)).total).toBe(97);
    expect(await treeAccuracy(scope)).toEqual([]);
  });

  it("the same file cannot be imported twice", async () => {
    const response = await preview(request("/api/imports/preview", { method: "POST", token: users.lead.token, body: fileForm(csv) }), params({}));
    const again = (await response.json()) as ImportPreview;
    expect(again.valid).toBe(0);
    expect(again.token).toBeNull();
    expect(again.problems[0]).toMatchObject({ line: 2, column: "reference", message: "A case \"OLD-1000\" exists already." });
  });

  it("a technician may not import", async () => {
    const response = await preview(request("/api/imports/preview", { method: "POST", token: users.tech.token, body: fileForm(csv) }), params({}));
    expect(response.status).toBe(403);
  });
});
