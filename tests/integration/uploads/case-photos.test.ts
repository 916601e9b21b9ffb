import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST } from "@/app/api/uploads/route";
import { cases } from "@/db/schema";
import { createSession } from "@/lib/auth/session";
import { countRows, createUser, db } from "../../support/db";
import { params, request } from "../../support/requests";
import { resetToDemo } from "../../support/seed";
import { startTestCase } from "../triage/helpers";

const uploadDir = mkdtempSync(path.join(os.tmpdir(), "rootbench-case-photos-"));
let png: Buffer;
let token: string;
let caseId: number;

async function post(fields: Record<string, string>) {
  const form = new FormData();
  form.set("file", new Blob([png as BlobPart], { type: "image/png" }), "bench.png");
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  return POST(request("/api/uploads", { method: "POST", token, body: form }), params({}));
}

beforeAll(async () => {
  process.env.UPLOAD_DIR = uploadDir;
  png = await sharp({ create: { width: 320, height: 200, channels: 3, background: "#4a6b3c" } }).png().toBuffer();
  await resetToDemo();
  const tech = await createUser("tech");
  token = (await createSession(tech.id)).token;
  caseId = (await startTestCase(tech)).id;
});
afterAll(() => {
  delete process.env.UPLOAD_DIR;
  rmSync(uploadDir, { recursive: true, force: true });
});

describe("photos linked to a case", () => {
  it("are taken while the unit is on the bench, and refused with a clear 409 once the case is closed", async () => {
    await db.update(cases).set({ status: "on_bench" }).where(eq(cases.id, caseId));
    expect((await post({ caseId: String(caseId) })).status).toBe(201);
    const before = await countRows("uploads");

    await db.update(cases).set({ status: "closed", closedAt: new Date() }).where(eq(cases.id, caseId));
    const refused = await post({ caseId: String(caseId) });
    expect(refused.status).toBe(409);
    expect(((await refused.json()) as { error: string }).error).toMatch(/closed.*reopen/);
    expect(await countRows("uploads")).toBe(before);
  });
});
