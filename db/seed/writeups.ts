import type { Tx } from "@/db";
import { writeupCauses, writeupFamilies, writeupParts, writeups } from "@/db/schema";
import type { Content } from "@/lib/content/catalogue";

interface Ids {
  familyId: Map<string, number>;
  causeId: Map<string, number>;
  partId: Map<string, number>;
  userOfRole: Map<string, string>;
}

/** The demo write-ups from content/writeups, with their links to families, causes and parts. */
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
  }
  return idOf;
}
