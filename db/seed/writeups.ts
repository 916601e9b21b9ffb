import { createHash } from "node:crypto";
import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import { eq } from "drizzle-orm";
import type { Tx } from "@/db";
import { writeupCauses, writeupFamilies, writeupParts, writeups } from "@/db/schema";
import type { Content, Writeup } from "@/db/seed/content";
import { rasteriseSvg } from "@/lib/storage/images";
import { storePhoto } from "@/lib/storage/uploads";
import { uploadUrl } from "@/lib/storage/urls";

interface Ids {
  familyId: Map<string, number>;
  causeId: Map<string, number>;
  partId: Map<string, number>;
  userOfRole: Map<string, string>;
  /** Where the drawings the write-ups name live; content/writeups/images by default. */
  imagesDir?: string;
}

const DEFAULT_IMAGES = path.join(__dirname, "../../content/writeups/images");
const IMAGE_REF = /\]\((?:\.\/)?images\/([a-z0-9-]+\.svg)\)/g;

// SVG can carry script, so it is never an upload: each drawing is rasterised to PNG once per
// process and stored under a key derived from its content, so seeding again adds no files.
const rasterCache = new Map<string, Promise<{ png: Buffer; key: string }>>();

function rasterised(file: string): Promise<{ png: Buffer; key: string }> {
  let entry = rasterCache.get(file);
  if (!entry) {
    entry = (async () => {
      const svg = readFileSync(file);
      const png = await rasteriseSvg(svg);
      return { png, key: `seed/${createHash("sha256").update(png).digest("hex").slice(0, 32)}.png` };
    })();
    rasterCache.set(file, entry);
  }
  return entry;
}

function drawingsOf(w: Writeup): string[] {
  return [...new Set([...[...w.body.matchAll(IMAGE_REF)].map((m) => m[1]), ...w.photos.filter((p) => p.endsWith(".svg"))])];
}

/** Stores the write-up's drawings as its uploads and points its Markdown at them. */
async function seedPhotos(tx: Tx, w: Writeup, writeupId: number, uploadedBy: string | null, imagesDir: string): Promise<void> {
  const drawings = drawingsOf(w);
  if (drawings.length === 0) return;
  const urlOf = new Map<string, string>();
  for (const name of drawings) {
    const file = path.join(imagesDir, name);
    if (!existsSync(file)) throw new Error(`write-up ${w.slug}: image ${name} is not in ${imagesDir}`);
    const { png, key } = await rasterised(file);
    const upload = await storePhoto({ bytes: png, originalName: name.replace(/\.svg$/, ".png"), uploadedBy, writeupId, storageKey: key }, tx);
    urlOf.set(name, uploadUrl(upload.id));
  }
  const body = w.body.replace(IMAGE_REF, (_match, name: string) => `](${urlOf.get(name)})`);
  if (body !== w.body) await tx.update(writeups).set({ body }).where(eq(writeups.id, writeupId));
}

/** The demo write-ups from content/writeups, with their links to families, causes and parts, and their photos. */
export async function seedWriteups(tx: Tx, content: Content, ids: Ids): Promise<Map<string, number>> {
  const idOf = new Map<string, number>();
  for (const w of content.writeups) {
    const at = new Date(`${w.date}T10:00:00Z`);
    const authorId = ids.userOfRole.get(w.author) ?? null;
    const [row] = await tx
      .insert(writeups)
      .values({
        slug: w.slug, title: w.title, summary: w.summary, body: w.body, status: w.status, authorId, tags: w.tags,
        createdAt: at, updatedAt: at,
        publishedAt: w.status === "published" ? at : null,
        publishedBy: w.status === "published" ? ids.userOfRole.get("senior") ?? null : null,
      })
      .returning({ id: writeups.id });
    idOf.set(w.slug, row.id);
    if (w.families.length) await tx.insert(writeupFamilies).values(w.families.map((f) => ({ writeupId: row.id, familyId: ids.familyId.get(f)! })));
    if (w.causes.length) await tx.insert(writeupCauses).values(w.causes.map((c) => ({ writeupId: row.id, causeId: ids.causeId.get(c)! })));
    if (w.parts.length) await tx.insert(writeupParts).values([...new Set(w.parts)].map((p) => ({ writeupId: row.id, partId: ids.partId.get(p)! })));
    await seedPhotos(tx, w, row.id, authorId, ids.imagesDir ?? DEFAULT_IMAGES);
  }
  return idOf;
}
