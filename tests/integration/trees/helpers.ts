import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { trees, treeVersions } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import type { SessionUser } from "@/lib/auth/session-user";
import { saveDraftAction, startDraftAction } from "@/lib/trees/actions";
import type { DraftGraph } from "@/lib/trees/draft";
import { graphToDraft } from "@/lib/trees/draft";
import { loadGraph } from "@/lib/trees/graph";

export async function treeBySlug(slug: string) {
  const [tree] = await db.select().from(trees).where(eq(trees.slug, slug));
  return tree;
}

/** Opens a draft of a demo tree (copied from its published version) and returns it with its graph. */
export async function openDraft(slug: string, user: SessionUser) {
  const tree = await treeBySlug(slug);
  const started = await executeAction(startDraftAction, { treeId: String(tree.id) }, user);
  if (!started.ok) throw new Error(started.error);
  const [version] = await db.select().from(treeVersions).where(and(eq(treeVersions.treeId, tree.id), eq(treeVersions.state, "draft")));
  const graph = graphToDraft((await loadGraph(version.id))!);
  return { tree, version, graph };
}

export function save(user: SessionUser, versionId: number, revision: number, graph: DraftGraph) {
  return executeAction(saveDraftAction, { versionId, revision, graph }, user);
}
