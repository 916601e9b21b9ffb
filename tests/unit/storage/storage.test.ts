import { mkdtempSync, readdirSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import sharp from "sharp";
import { afterAll, describe, expect, it } from "vitest";
import { isAppError } from "@/lib/errors";
import { examinePhoto } from "@/lib/storage/images";
import { MAX_UPLOAD_BYTES, readBodyLimited } from "@/lib/storage/limits";
import { LocalDiskStore } from "@/lib/storage/local-disk";
import { isPhotoKind, sniff } from "@/lib/storage/sniff";
import { uploadIdsIn, UPLOAD_SRC_PATTERN } from "@/lib/storage/urls";

const bytes = (...values: (number | string)[]) =>
  new Uint8Array(values.flatMap((v) => (typeof v === "string" ? [...v].map((c) => c.charCodeAt(0)) : [v])));

describe("type sniffing by magic bytes", () => {
  // Signatures: JPEG SOI FF D8 FF, the 8-byte PNG signature, RIFF....WEBP (the formats' own specifications).
  it("recognises JPEG, PNG and WebP as photos", () => {
    expect(sniff(bytes(0xff, 0xd8, 0xff, 0xe0, 0, 0x10)).mime).toBe("image/jpeg");
    expect(sniff(bytes(0x89, "PNG", 0x0d, 0x0a, 0x1a, 0x0a, 0, 0)).mime).toBe("image/png");
    expect(sniff(bytes("RIFF", 0x24, 0, 0, 0, "WEBPVP8 ")).mime).toBe("image/webp");
    for (const kind of ["jpeg", "png", "webp"] as const) expect(isPhotoKind(kind)).toBe(true);
  });

  it("names what else a file is, and never calls it a photo", () => {
    expect(sniff(bytes("GIF89a", 1, 0)).kind).toBe("gif");
    expect(sniff(bytes("%PDF-1.7")).kind).toBe("pdf");
    expect(sniff(bytes(0xef, 0xbb, 0xbf, " \n<svg onload=alert(1)>")).kind).toBe("markup");
    expect(sniff(bytes("RIFF", 0, 0, 0, 0, "WAVE")).kind).toBe("unknown");
    expect(sniff(new Uint8Array(0)).kind).toBe("unknown");
    for (const kind of ["gif", "pdf", "markup", "unknown"] as const) expect(isPhotoKind(kind)).toBe(false);
  });
});

describe("the local-disk store", () => {
  const root = mkdtempSync(path.join(os.tmpdir(), "rootbench-store-"));
  const store = new LocalDiskStore(root);
  afterAll(() => rmSync(root, { recursive: true, force: true }));

  it("puts, gets and deletes by key, leaving no temporary files", async () => {
    await store.put("photos/ab/abc123", bytes("hello"));
    expect((await store.get("photos/ab/abc123"))?.toString()).toBe("hello");
    await store.put("photos/ab/abc123", bytes("again"));
    expect((await store.get("photos/ab/abc123"))?.toString()).toBe("again");
    expect(readdirSync(path.join(root, "photos/ab"))).toEqual(["abc123"]);
    await store.delete("photos/ab/abc123");
    expect(await store.get("photos/ab/abc123")).toBeNull();
    await store.delete("photos/ab/abc123");
  });

  it("refuses keys that could leave its folder", async () => {
    for (const key of ["../escape", "a/../../b", "/abs", "a//b", "a\\b", ""]) {
      await expect(store.put(key, bytes("x")), key).rejects.toThrow(/Invalid storage key/);
    }
  });
});

describe("reading a body with a size cap", () => {
  const statusOf = async (promise: Promise<unknown>) => promise.then(() => 200, (e: unknown) => (isAppError(e) ? e.status : 500));

  it("refuses a declared Content-Length over the cap before reading anything", async () => {
    let pulled = false;
    const body = new ReadableStream<Uint8Array>({ pull() { pulled = true; } }, { highWaterMark: 0 });
    const request = new Request("http://x.invalid/", { method: "POST", body, headers: { "content-length": String(MAX_UPLOAD_BYTES + 1) }, duplex: "half" } as RequestInit);
    expect(await statusOf(readBodyLimited(request, MAX_UPLOAD_BYTES))).toBe(413);
    expect(pulled).toBe(false);
  });

  it("stops a body without a length as soon as it passes the cap", async () => {
    let sent = 0;
    const chunk = new Uint8Array(1_000_000);
    const body = new ReadableStream<Uint8Array>({ pull(c) { sent += chunk.length; c.enqueue(chunk); } });
    const request = new Request("http://x.invalid/", { method: "POST", body, duplex: "half" } as RequestInit);
    expect(await statusOf(readBodyLimited(request, 3_500_000))).toBe(413);
    expect(sent).toBeLessThanOrEqual(6_000_000);
  });

  it("returns a body under the cap whole", async () => {
    const request = new Request("http://x.invalid/", { method: "POST", body: "x".repeat(1000) });
    expect((await readBodyLimited(request, 2000)).byteLength).toBe(1000);
  });
});

describe("photo facts and thumbnails", () => {
  it("records the size and makes a 320 px wide WebP thumbnail", async () => {
    const png = await sharp({ create: { width: 1200, height: 800, channels: 3, background: "#3f7d4e" } }).png().toBuffer();
    const facts = await examinePhoto(png);
    expect([facts.width, facts.height]).toEqual([1200, 800]);
    const thumb = await sharp(facts.thumbnail).metadata();
    expect([thumb.format, thumb.width, thumb.height]).toEqual(["webp", 320, 213]);
  });

  it("keeps a photo without metadata byte for byte, and strips the location and camera data of one that has it", async () => {
    const plain = await sharp({ create: { width: 400, height: 300, channels: 3, background: "#7a5230" } }).jpeg().toBuffer();
    expect(Buffer.from((await examinePhoto(plain)).original).equals(plain)).toBe(true);

    // As a phone writes it: GPS position, device, and an orientation of 6 (turned 90° clockwise).
    const tagged = await sharp({ create: { width: 400, height: 300, channels: 3, background: "#7a5230" } })
      .withMetadata({ orientation: 6 })
      .withExif({ IFD0: { Make: "Invented Phone Co", Model: "Demo 1" }, IFD3: { GPSLatitudeRef: "N", GPSLatitude: "52/1 22/1 0/1" } })
      .jpeg().toBuffer();
    expect((await sharp(tagged).metadata()).orientation).toBe(6);
    expect(tagged.includes("Invented Phone Co")).toBe(true);
    const facts = await examinePhoto(tagged);
    const kept = await sharp(facts.original).metadata();
    expect(kept.exif).toBeUndefined();
    expect(kept.format).toBe("jpeg");
    expect(Buffer.from(facts.original).includes("Invented Phone Co")).toBe(false);
    // Turned upright, so it shows the same way without the orientation tag.
    expect([kept.width, kept.height]).toEqual([300, 400]);
    expect([facts.width, facts.height]).toEqual([300, 400]);
  });

  it("does not enlarge a small photo, and refuses a damaged one with 415", async () => {
    const small = await sharp({ create: { width: 100, height: 50, channels: 3, background: "#000" } }).jpeg().toBuffer();
    expect((await sharp((await examinePhoto(small)).thumbnail).metadata()).width).toBe(100);
    const broken = Buffer.concat([small.subarray(0, 40), Buffer.alloc(200)]);
    await expect(examinePhoto(broken)).rejects.toMatchObject({ status: 415 });
  });
});

describe("upload image sources", () => {
  it("accepts only our upload route, full size or thumbnail", () => {
    const id = "0123456789abcdef0123456789abcdef";
    expect(UPLOAD_SRC_PATTERN.test(`/api/uploads/${id}`)).toBe(true);
    expect(UPLOAD_SRC_PATTERN.test(`/api/uploads/${id}/thumb`)).toBe(true);
    for (const src of [`/api/uploads/${id}x`, `/api/uploads/${id}?a=1`, `https://evil.invalid/api/uploads/${id}`, `/api/uploads/../${id}`]) {
      expect(UPLOAD_SRC_PATTERN.test(src), src).toBe(false);
    }
    expect(uploadIdsIn(`![a](/api/uploads/${id}) and ![b](/api/uploads/${id}/thumb)`)).toEqual([id]);
  });
});
