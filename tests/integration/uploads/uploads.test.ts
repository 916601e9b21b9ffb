import { mkdtempSync, readdirSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import sharp from "sharp";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { GET as getOriginal } from "@/app/api/uploads/[id]/route";
import { GET as getThumb } from "@/app/api/uploads/[id]/thumb/route";
import { POST } from "@/app/api/uploads/route";
import { writeups } from "@/db/schema";
import { countRows, createRoleUsers, db, truncateAll } from "../../support/db";
import { params, request } from "../../support/requests";

type Users = Awaited<ReturnType<typeof createRoleUsers>>;

let users: Users;
const uploadDir = mkdtempSync(path.join(os.tmpdir(), "rootbench-uploads-"));
let png: Buffer;

function filesOnDisk(): string[] {
  const out: string[] = [];
  const walk = (dir: string) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      if (entry.isDirectory()) walk(path.join(dir, entry.name));
      else out.push(path.join(dir, entry.name));
    }
  };
  walk(uploadDir);
  return out;
}

async function post(token: string | undefined, file: Blob | null, name = "photo.png", fields: Record<string, string> = {}) {
  const form = new FormData();
  if (file) form.set("file", file, name);
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  return POST(request("/api/uploads", { method: "POST", token, body: form }), params({}));
}

const blob = (data: Uint8Array | string, type = "application/octet-stream") => new Blob([data as BlobPart], { type });
const get = (id: string, token?: string) => getOriginal(request(`/api/uploads/${id}`, { token }), params({ id }));

beforeAll(async () => {
  process.env.UPLOAD_DIR = uploadDir;
  png = await sharp({ create: { width: 1000, height: 640, channels: 3, background: "#b4532a" } }).png().toBuffer();
});
beforeEach(async () => {
  for (const entry of readdirSync(uploadDir)) rmSync(path.join(uploadDir, entry), { recursive: true, force: true });
  await truncateAll();
  users = await createRoleUsers();
});
afterAll(() => {
  delete process.env.UPLOAD_DIR;
  rmSync(uploadDir, { recursive: true, force: true });
});

describe("POST /api/uploads", () => {
  it("stores a photo with its size and a thumbnail, and answers with the Markdown to insert", async () => {
    const response = await post(users.tech.token, blob(png, "image/png"), "worn cage.png");
    expect(response.status).toBe(201);
    const body = (await response.json()) as { id: string; url: string; width: number; height: number; mime: string; markdown: string };
    expect(body).toMatchObject({ width: 1000, height: 640, mime: "image/png", url: `/api/uploads/${body.id}`, markdown: `![worn cage](/api/uploads/${body.id})` });
    expect(body.id).toMatch(/^[a-f0-9]{32}$/);
    expect(await countRows("uploads")).toBe(1);
    const files = filesOnDisk();
    expect(files).toHaveLength(2);
    expect(files.some((f) => f.endsWith(".thumb.webp"))).toBe(true);
    expect(files.every((f) => !f.includes("worn"))).toBe(true);
  });

  it("refuses SVG even when its name says .png, with a clear 415, and writes nothing", async () => {
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"><rect width="10" height="10"/></svg>`;
    const response = await post(users.senior.token, blob(svg, "image/png"), "drawing.png");
    expect(response.status).toBe(415);
    expect(((await response.json()) as { error: string }).error).toMatch(/JPEG, PNG or WebP.*"drawing\.png" is SVG, HTML or other markup, whatever its name says/);
    expect(await countRows("uploads")).toBe(0);
    expect(filesOnDisk()).toEqual([]);
  });

  it("refuses GIF, PDF and unknown bytes with 415", async () => {
    for (const [data, name] of [["GIF89a....", "a.gif"], ["%PDF-1.7 ...", "a.jpg"], ["plain words", "a.webp"]] as const) {
      expect((await post(users.admin.token, blob(data), name)).status, name).toBe(415);
    }
    expect(filesOnDisk()).toEqual([]);
  });

  it("refuses a file over 10 MB with 413 before anything is stored", async () => {
    const big = new Uint8Array(10_000_001);
    big.set(png.subarray(0, 8));
    const response = await post(users.tech.token, blob(big, "image/png"), "huge.png");
    expect(response.status).toBe(413);
    expect(((await response.json()) as { error: string }).error).toMatch(/10 MB/);
    expect(await countRows("uploads")).toBe(0);
    expect(filesOnDisk()).toEqual([]);
  });

  it("asks for a multipart form with a file field", async () => {
    expect((await post(users.tech.token, null)).status).toBe(400);
    const json = await POST(request("/api/uploads", { method: "POST", token: users.tech.token, body: { file: "x" } }), params({}));
    expect(json.status).toBe(400);
  });

  it("is for roles that draft write-ups or work cases", async () => {
    expect((await post(undefined, blob(png))).status).toBe(401);
    expect((await post(users.trainee.token, blob(png))).status).toBe(403);
    expect((await post(users.lead.token, blob(png))).status).toBe(403);
    expect(await countRows("uploads")).toBe(0);
  });

  it("links a photo to a write-up only for someone who may edit it", async () => {
    const [draft] = await db.insert(writeups).values({ slug: "d", title: "Draft", status: "draft", authorId: users.tech.id }).returning();
    expect((await post(users.tech.token, blob(png), "a.png", { writeupId: String(draft.id) })).status).toBe(201);
    expect((await post(users.admin.token, blob(png), "a.png", { writeupId: String(draft.id) })).status).toBe(201);
    expect((await post(users.tech.token, blob(png), "a.png", { writeupId: "999999" })).status).toBe(404);
    expect((await post(users.tech.token, blob(png), "a.png", { caseId: "999999" })).status).toBe(404);
    expect((await post(users.tech.token, blob(png), "a.png", { writeupId: "x1" })).status).toBe(400);
    expect(await countRows("uploads")).toBe(2);
  });
});

describe("GET /api/uploads/[id] and its thumbnail", () => {
  async function uploaded(token: string, fields: Record<string, string> = {}): Promise<string> {
    const response = await post(token, blob(png, "image/png"), "bench.png", fields);
    return ((await response.json()) as { id: string }).id;
  }

  it("serves the bytes with their type, nosniff and a long private cache", async () => {
    const id = await uploaded(users.tech.token);
    const response = await get(id, users.senior.token);
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("image/png");
    expect(response.headers.get("x-content-type-options")).toBe("nosniff");
    expect(response.headers.get("cache-control")).toBe("private, max-age=31536000, immutable");
    expect(Buffer.from(await response.arrayBuffer()).equals(png)).toBe(true);
    const thumb = await getThumb(request(`/api/uploads/${id}/thumb`, { token: users.tech.token }), params({ id }));
    expect(thumb.headers.get("content-type")).toBe("image/webp");
    expect((await sharp(Buffer.from(await thumb.arrayBuffer())).metadata()).width).toBe(320);
  });

  it("only to signed-in users, and a write-up's photo follows the write-up", async () => {
    const [draft] = await db.insert(writeups).values({ slug: "p", title: "Photo draft", status: "draft", authorId: users.tech.id }).returning();
    const id = await uploaded(users.tech.token, { writeupId: String(draft.id) });
    expect((await get(id)).status).toBe(401);
    expect((await get(id, users.trainee.token)).status).toBe(403);
    expect((await get(id, users.lead.token)).status).toBe(200);
    await db.update(writeups).set({ status: "published" });
    expect((await get(id, users.trainee.token)).status).toBe(200);
  });

  it("keeps a photo not yet linked to anything from trainees", async () => {
    const id = await uploaded(users.tech.token);
    expect((await get(id, users.trainee.token)).status).toBe(403);
    expect((await get(id, users.admin.token)).status).toBe(200);
  });

  it("answers 404 for unknown and malformed ids", async () => {
    expect((await get("0123456789abcdef0123456789abcdef", users.admin.token)).status).toBe(404);
    expect((await get("../../etc/passwd", users.admin.token)).status).toBe(404);
  });
});
