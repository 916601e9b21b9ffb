import { eq } from "drizzle-orm";
import type { Tx } from "@/db";
import { trees, treeScope, treeVersions } from "@/db/schema";
import type { Content } from "@/db/seed/content";
import { treeFileToGraphInput } from "@/lib/trees/file/convert";
import { writeGraph } from "@/lib/trees/graph";

/** Each demo tree as version 1, published. Returns tree slug → published version id. */
export async function seedTrees(tx: Tx, content: Content, familyId: Map<string, number>, authorId: string) {
  const versionOf = new Map<string, number>();
  for (const file of content.trees) {
    const [tree] = await tx
      .insert(trees)
      .values({ slug: file.slug, symptom: file.symptom, title: file.title, description: file.description, createdBy: authorId })
      .returning({ id: trees.id });
    if (file.scope.length) {
      await tx.insert(treeScope).values(file.scope.map((slug) => ({ treeId: tree.id, familyId: familyId.get(slug)! })));
    }
    const [version] = await tx
      .insert(treeVersions)
      .values({ treeId: tree.id, number: 1, state: "draft", editedBy: authorId, editedAt: new Date("2024-11-12T15:00:00Z"), note: "First edition from the workshop's notes" })
      .returning({ id: treeVersions.id });
    await writeGraph(tx, version.id, treeFileToGraphInput(file));
    await tx
      .update(treeVersions)
      .set({ state: "published", publishedBy: authorId, publishedAt: new Date("2024-11-15T09:00:00Z") })
      .where(eq(treeVersions.id, version.id));
    versionOf.set(file.slug, version.id);
  }
  return versionOf;
}
