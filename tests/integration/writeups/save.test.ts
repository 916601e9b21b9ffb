import { rmSync } from "node:fs";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { uploads, writeupCauses, writeupFamilies, writeupParts, writeups } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import type { SessionUser } from "@/lib/auth/session-user";
import { publishWriteupAction, saveWriteupAction } from "@/lib/writeups/actions";
import { countRows, createUser, db } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { catalogueIds, draftInput, useTemporaryUploads } from "./fixtures";

let dir: string;
let ids: Awaited<ReturnType<typeof catalogueIds>>;
let tech: SessionUser, otherTech: SessionUser, senior: SessionUser, trainee: SessionUser;

const save = (input: Record<string, unknown>, user: SessionUser) => executeAction(saveWriteupAction, input, user);
const counts = async () => Promise.all(["writeups", "writeup_families", "writeup_causes", "writeup_parts"].map(countRows));

beforeAll(async () => {
  dir = useTemporaryUploads();
  await resetToDemo();
  ids = await catalogueIds();
});
beforeEach(async () => {
  [tech, otherTech, senior, trainee] = await Promise.all([createUser("tech"), createUser("tech"), createUser("senior"), createUser("trainee")]);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("saving a write-up", () => {
  it("a technician saves a draft with its links, tags cleaned and a slug from the title", async () => {
    const result = await save(draftInput(ids), tech);
    expect(result).toMatchObject({ ok: true, data: { status: "draft" }, message: "Draft saved." });
    if (!result.ok) return;
    const [row] = await db.select().from(writeups).where(eq(writeups.id, result.data.id));
    expect(row).toMatchObject({ status: "draft", authorId: tech.id, tags: ["belt", "cold"], publishedAt: null });
    expect(row.slug).toMatch(/^belt-chirp-on-cold-mornings(-\d+)?$/);
    expect(await db.select().from(writeupCauses).where(eq(writeupCauses.writeupId, row.id))).toHaveLength(1);
    expect(await db.select().from(writeupParts).where(eq(writeupParts.writeupId, row.id))).toHaveLength(1);
  });

  it("a technician may not publish; nothing is written", async () => {
    const before = await counts();
    const result = await save(draftInput(ids, { intent: "publish" }), tech);
    expect(result).toMatchObject({ ok: false, status: 403 });
    expect(await counts()).toEqual(before);
  });

  it("a senior mechanic publishes directly", async () => {
    const result = await save(draftInput(ids, { intent: "publish", title: "Published straight away" }), senior);
    expect(result).toMatchObject({ ok: true, data: { status: "published" } });
    if (!result.ok) return;
    const [row] = await db.select().from(writeups).where(eq(writeups.id, result.data.id));
    expect(row.publishedBy).toBe(senior.id);
    expect(row.publishedAt).toBeInstanceOf(Date);
  });

  it("says what is wrong, field by field, and keeps what was typed", async () => {
    const form = new FormData();
    for (const [k, v] of Object.entries(draftInput(ids, { title: "ab", summary: "", body: "short", tags: "a".repeat(41), intent: "maybe" }))) {
      for (const value of Array.isArray(v) ? v : [v]) form.append(k, String(value));
    }
    const result = await executeAction(saveWriteupAction, form, tech);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.status).toBe(400);
    expect(result.fieldErrors).toMatchObject({
      title: "Give the write-up a title of at least 5 characters.",
      summary: "Write a summary of at least 10 characters: what failed and why.",
      body: "Write the body: what was reported, what was found, what was done.",
      intent: "Choose to save a draft or to publish.",
    });
    expect(result.fieldErrors?.tags).toMatch(/under 40 characters/);
    expect(result.fields?.title).toBe("ab");
  });

  it("publishing needs a motor family and a cause", async () => {
    const result = await save(draftInput(ids, { intent: "publish", familyIds: [], causeIds: [] }), senior);
    expect(result).toMatchObject({ ok: false, status: 422, fieldErrors: { familyIds: expect.any(String), causeIds: expect.any(String) } });
  });

  it("refuses unknown catalogue entries or case references and writes nothing", async () => {
    const before = await counts();
    expect(await save(draftInput(ids, { causeIds: [String(ids.causes[0]), "999999"] }), tech))
      .toMatchObject({ ok: false, status: 422, fieldErrors: { causeIds: "Unknown causes." } });
    expect(await save(draftInput(ids, { caseReference: "NO-SUCH-CASE" }), tech))
      .toMatchObject({ ok: false, status: 422, fieldErrors: { caseReference: "No case has that reference." } });
    expect(await counts()).toEqual(before);
  });

  it("a bad edit leaves the write-up exactly as it was", async () => {
    const created = await save(draftInput(ids), tech);
    if (!created.ok) throw new Error("setup failed");
    const id = created.data.id;
    const snapshot = async () => ({
      row: (await db.select().from(writeups).where(eq(writeups.id, id)))[0],
      families: await db.select().from(writeupFamilies).where(eq(writeupFamilies.writeupId, id)),
      parts: await db.select().from(writeupParts).where(eq(writeupParts.writeupId, id)),
    });
    const before = await snapshot();
    const result = await save(draftInput(ids, { id: String(id), title: "A changed title", familyIds: [String(ids.families[1])], partIds: ["999999"] }), tech);
    expect(result).toMatchObject({ ok: false, status: 422 });
    expect(await snapshot()).toEqual(before);
  });

  it("an edit replaces the links; a stale editor gets 409", async () => {
    const created = await save(draftInput(ids), tech);
    if (!created.ok) throw new Error("setup failed");
    const [row] = await db.select().from(writeups).where(eq(writeups.id, created.data.id));
    const edit = { id: String(row.id), expectedUpdatedAt: row.updatedAt.toISOString(), familyIds: ids.families.map(String), partIds: [] };
    expect(await save(draftInput(ids, edit), tech)).toMatchObject({ ok: true });
    expect(await db.select().from(writeupFamilies).where(eq(writeupFamilies.writeupId, row.id))).toHaveLength(2);
    expect(await db.select().from(writeupParts).where(eq(writeupParts.writeupId, row.id))).toHaveLength(0);
    expect(await save(draftInput(ids, edit), tech)).toMatchObject({ ok: false, status: 409 });
  });

  it("who may change what: own drafts for technicians, anything for seniors", async () => {
    const created = await save(draftInput(ids), tech);
    if (!created.ok) throw new Error("setup failed");
    const edit = draftInput(ids, { id: String(created.data.id), title: "Edited by someone" });
    expect(await save(edit, otherTech)).toMatchObject({ ok: false, status: 403 });
    expect(await save(edit, trainee)).toMatchObject({ ok: false, status: 403 });
    expect(await save({ ...edit, intent: "publish" }, senior)).toMatchObject({ ok: true, data: { status: "published" } });
    expect(await save(edit, tech)).toMatchObject({ ok: false, status: 403 });
    expect(await save(draftInput(ids, { id: "999999" }), senior)).toMatchObject({ ok: false, status: 404 });
  });

  it("photos uploaded before the first save become the write-up's photos", async () => {
    const photoId = "ab".repeat(16);
    await db.insert(uploads).values({ id: photoId, storageKey: "photos/ab/x", originalName: "x.png", mime: "image/png", bytes: 1, uploadedBy: tech.id });
    const result = await save(draftInput(ids, { body: `## Found\n\nSee the photo.\n\n![cage](/api/uploads/${photoId})` }), tech);
    if (!result.ok) throw new Error("save failed");
    const [photo] = await db.select().from(uploads).where(eq(uploads.id, photoId));
    expect(photo.writeupId).toBe(result.data.id);
  });
});

describe("publishing a draft", () => {
  it("a senior publishes a technician's draft; publishing twice is a conflict", async () => {
    const created = await save(draftInput(ids), tech);
    if (!created.ok) throw new Error("setup failed");
    expect(await executeAction(publishWriteupAction, { id: String(created.data.id) }, tech)).toMatchObject({ ok: false, status: 403 });
    expect(await executeAction(publishWriteupAction, { id: String(created.data.id) }, senior)).toMatchObject({ ok: true });
    const [row] = await db.select().from(writeups).where(eq(writeups.id, created.data.id));
    expect(row).toMatchObject({ status: "published", publishedBy: senior.id });
    expect(await executeAction(publishWriteupAction, { id: String(created.data.id) }, senior)).toMatchObject({ ok: false, status: 409 });
  });

  it("a draft without a cause cannot be published", async () => {
    const created = await save(draftInput(ids, { causeIds: [] }), tech);
    if (!created.ok) throw new Error("setup failed");
    const result = await executeAction(publishWriteupAction, { id: String(created.data.id) }, senior);
    expect(result).toMatchObject({ ok: false, status: 422 });
    expect((await db.select().from(writeups).where(eq(writeups.id, created.data.id)))[0].status).toBe("draft");
  });
});
