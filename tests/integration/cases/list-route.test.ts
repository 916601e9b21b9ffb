import { beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { GET } from "@/app/api/cases/route";
import { cases } from "@/db/schema";
import type { CaseListPage } from "@/lib/cases/cases-key";
import { createSession } from "@/lib/auth/session";
import { createUser, db } from "../../support/db";
import { params, request } from "../../support/requests";
import { resetToDemo } from "../../support/seed";
import { familyId, startTestCase } from "../triage/helpers";

describe("GET /api/cases", () => {
  let token: string;
  beforeAll(async () => {
    await resetToDemo();
    const tech = await createUser("tech");
    token = (await createSession(tech.id)).token;
    for (let i = 0; i < 7; i++) await startTestCase(tech);
    const other = await startTestCase(tech, { familyId: await familyId("quillon-skarn-1"), callerName: "Oda Brackwater" });
    await db.update(cases).set({ status: "advised" }).where(eq(cases.id, other.id));
  });

  async function get(qs: string) {
    const response = await GET(request(`/api/cases?${qs}`, { token }), params({}));
    return { status: response.status, body: (await response.json()) as CaseListPage & { error?: string } };
  }

  it("pages on the server and reports the total", async () => {
    const first = await get("limit=3&sort=reference&dir=asc");
    expect(first.status).toBe(200);
    expect(first.body.total).toBe(8);
    expect(first.body.rows.map((r) => r.reference.slice(-4))).toEqual(["0001", "0002", "0003"]);
    const third = await get("limit=3&page=3&sort=reference&dir=asc");
    expect(third.body.rows.map((r) => r.reference.slice(-4))).toEqual(["0007", "0008"]);
  });

  it("filters by status, family and caller search", async () => {
    const advised = await get("status=advised");
    expect(advised.body.rows.map((r) => r.callerName)).toEqual(["Oda Brackwater"]);
    expect(advised.body.rows[0].familyName).toBe("Quillon Skarn Gen 1");
    expect((await get(`family=${await familyId("orvanta-tessel-2")}`)).body.total).toBe(7);
    expect((await get("q=brack")).body.total).toBe(1);
    expect((await get("from=2000-01-01&to=2000-01-31")).body.total).toBe(0);
  });

  it("sorts status in lifecycle order", async () => {
    const rows = (await get("sort=status&dir=asc&limit=100")).body.rows;
    expect(rows[0].status).toBe("open");
    expect(rows.at(-1)!.status).toBe("advised");
  });

  it("refuses a page size over 100 with a clear message", async () => {
    const r = await get("limit=500");
    expect(r.status).toBe(400);
    expect(r.body.error).toBe("limit: At most 100 rows a page.");
  });
});
