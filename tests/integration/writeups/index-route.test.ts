import { rmSync } from "node:fs";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET } from "@/app/api/writeups/index/route";
import { causes, uploads, writeups } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import type { WriteupIndexPayload } from "@/lib/search/types";
import { currentWriteupIndex } from "@/lib/search/index-data";
import { WriteupIndex } from "@/lib/search/writeup-index";
import { comparable } from "../../support/search";
import { publishWriteupAction } from "@/lib/writeups/actions";
import { createRoleUsers, db } from "../../support/db";
import { params, request } from "../../support/requests";
import { resetToDemo } from "../../support/seed";
import { useTemporaryUploads } from "./fixtures";

let dir: string;
let users: Awaited<ReturnType<typeof createRoleUsers>>;
const fetchIndex = (token: string, headers: Record<string, string> = {}) =>
  GET(request("/api/writeups/index", { token, headers }), params({}));

beforeAll(async () => {
  dir = useTemporaryUploads();
  await resetToDemo();
  users = await createRoleUsers();
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("GET /api/writeups/index", () => {
  it("sends every published write-up's searchable fields and no draft", async () => {
    const response = await fetchIndex(users.trainee.token);
    expect(response.status).toBe(200);
    const payload = (await response.json()) as WriteupIndexPayload;
    const published = await db.select({ id: writeups.id }).from(writeups).where(eq(writeups.status, "published"));
    const drafts = await db.select({ id: writeups.id, title: writeups.title }).from(writeups).where(eq(writeups.status, "draft"));
    expect(drafts.length).toBeGreaterThan(0);
    expect(payload.docs.map((d) => d.id).sort()).toEqual(published.map((p) => p.id).sort());
    expect(payload.docs.some((d) => drafts.some((x) => x.id === d.id || x.title === d.title))).toBe(false);
    const first = payload.docs[0];
    expect(first.causes.length).toBe(first.causeSlugs.length);
    expect(first.families.length).toBeGreaterThan(0);
    expect(payload.docs.every((d) => !/(^|\s)#{2,}\s|!\[|\]\(/.test(d.text))).toBe(true);
    // The drafts are not findable either, even by their exact titles, in the index the server sends.
    const index = new WriteupIndex(payload.docs, payload.index);
    for (const d of drafts) expect(index.search(d.title).some((h) => h.doc.title === d.title)).toBe(false);
    // That index answers exactly as one the browser would build from the documents.
    const built = new WriteupIndex(payload.docs);
    for (const q of ["sprag", "bearnig", "water", "crank bea", "clutch slip", payload.docs[0].title]) expect(comparable(index.search(q))).toEqual(comparable(built.search(q)));
  });

  it("answers 304 to a matching If-None-Match, and publishing a write-up changes the ETag", async () => {
    const first = await fetchIndex(users.tech.token);
    const etag = first.headers.get("etag")!;
    expect(etag).toMatch(/^"wi-\d+-\d+-[0-9a-f]{16}"$/);
    expect(first.headers.get("cache-control")).toBe("private, no-cache");
    const again = await fetchIndex(users.tech.token, { "if-none-match": etag });
    expect(again.status).toBe(304);
    expect(await again.text()).toBe("");

    const [draft] = await db.select().from(writeups).where(eq(writeups.status, "draft")).limit(1);
    expect(await executeAction(publishWriteupAction, { id: String(draft.id) }, users.senior)).toMatchObject({ ok: true });
    const after = await fetchIndex(users.tech.token, { "if-none-match": etag });
    expect(after.status).toBe(200);
    expect(after.headers.get("etag")).not.toBe(etag);
    const payload = (await after.json()) as WriteupIndexPayload;
    expect(payload.version).toBe(after.headers.get("etag"));
    expect(payload.docs.some((d) => d.id === draft.id)).toBe(true);
  });
});

describe("the index body on the server", () => {
  it("is built once per version: readers arriving during a build share it, and a publish makes a new version", async () => {
    const [a, b] = await Promise.all([currentWriteupIndex(), currentWriteupIndex()]);
    expect(a.body()).toBe(b.body());
    const built = await a.body();
    expect(built.etag).toBe(a.etag);

    const [draft] = await db.select().from(writeups).where(eq(writeups.status, "draft")).limit(1);
    expect(await executeAction(publishWriteupAction, { id: String(draft.id) }, users.senior)).toMatchObject({ ok: true });
    const next = await currentWriteupIndex();
    expect(next.etag).not.toBe(a.etag);
    // The body for the new version carries the write-up just published.
    const body = await next.body();
    expect((JSON.parse(body.json) as WriteupIndexPayload).docs.some((d) => d.id === draft.id)).toBe(true);
  });

  it("is a new version when a cause the write-ups name is renamed, and carries the new name", async () => {
    const before = await currentWriteupIndex();
    const named = (JSON.parse((await before.body()).json) as WriteupIndexPayload).docs.find((d) => d.causeSlugs.length > 0)!;
    const slug = named.causeSlugs[0];
    const [cause] = await db.select().from(causes).where(eq(causes.slug, slug));
    await db.update(causes).set({ name: `${cause.name} (renamed)` }).where(eq(causes.id, cause.id));
    try {
      const after = await currentWriteupIndex();
      expect(after.etag).not.toBe(before.etag);
      const doc = (JSON.parse((await after.body()).json) as WriteupIndexPayload).docs.find((d) => d.id === named.id)!;
      expect(doc.causes).toContain(`${cause.name} (renamed)`);
    } finally {
      await db.update(causes).set({ name: cause.name }).where(eq(causes.id, cause.id));
    }
  });
});

describe("the seeded write-ups' drawings", () => {
  it("are PNG uploads linked to their write-ups, and the Markdown points at our upload route", async () => {
    const rows = await db.select().from(writeups);
    const withImages = rows.filter((w) => w.body.includes("!["));
    expect(withImages.length).toBeGreaterThan(0);
    for (const w of withImages) {
      expect(w.body, w.slug).not.toMatch(/images\/|\.svg/);
      const ids = [...w.body.matchAll(/\/api\/uploads\/([a-f0-9]{32})/g)].map((m) => m[1]);
      expect(ids.length, w.slug).toBeGreaterThan(0);
      const linked = await db.select().from(uploads).where(eq(uploads.writeupId, w.id));
      for (const id of ids) expect(linked.find((u) => u.id === id), `${w.slug} ${id}`).toMatchObject({ mime: "image/png", width: 1280, height: 800 });
    }
  });
});
