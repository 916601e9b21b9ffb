import { eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { optionEvidence, treeNodes, treeOptions, treeVersions } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import type { SessionUser } from "@/lib/auth/session-user";
import { discardDraftAction, publishDraftAction, startDraftAction } from "@/lib/trees/actions";
import { addNode, updateNode } from "@/lib/trees/ops";
import { countRows, createUser } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { openDraft, save } from "./helpers";

const sqlStateOf = (e: unknown) => (e as { cause?: { code?: string } }).cause?.code ?? (e as { code?: string }).code;

async function rejection(p: Promise<unknown>): Promise<unknown> {
  try {
    await p;
  } catch (error) {
    return error;
  }
  throw new Error("expected the statement to fail");
}

describe("publishing", () => {
  let senior: SessionUser;
  beforeAll(async () => {
    await resetToDemo();
    senior = await createUser("senior", { name: "Ilse Marrow" });
  });

  it("is refused while a problem stands, and the draft stays a draft", async () => {
    const { version, graph } = await openDraft("water-cutout", senior);
    const saved = await save(senior, version.id, version.revision, addNode(graph, "question", { x: 0, y: 0 }).draft);
    expect(saved.ok).toBe(true);
    const refused = await executeAction(publishDraftAction, { versionId: version.id, revision: version.revision + 1 }, senior);
    expect(refused.ok).toBe(false);
    if (!refused.ok) expect([refused.status, refused.error]).toEqual([422, "3 problems must be fixed before this draft can be published."]);
    const [row] = await db.select().from(treeVersions).where(eq(treeVersions.id, version.id));
    expect(row.state).toBe("draft");
    // Clean up: back to the published graph, which has no problems.
    expect((await save(senior, version.id, version.revision + 1, graph)).ok).toBe(true);
  });

  it("freezes the version: its rows can no longer be updated, inserted or deleted", async () => {
    const { version, graph } = await openDraft("water-cutout", senior);
    const [current] = await db.select().from(treeVersions).where(eq(treeVersions.id, version.id));
    const edited = updateNode(graph, graph.nodes[0].key, { title: "Water in the unit?" });
    expect((await save(senior, version.id, current.revision, edited)).ok).toBe(true);
    const published = await executeAction(publishDraftAction, { versionId: version.id, revision: current.revision + 1, note: "Clearer first question" }, senior);
    expect(published.ok, JSON.stringify(published)).toBe(true);

    const [row] = await db.select().from(treeVersions).where(eq(treeVersions.id, version.id));
    expect([row.state, row.publishedBy, row.note, row.publishedAt instanceof Date]).toEqual(["published", senior.id, "Clearer first question", true]);

    const [node] = await db.select().from(treeNodes).where(eq(treeNodes.versionId, version.id)).limit(1);
    const [option] = await db.select().from(treeOptions).where(eq(treeOptions.versionId, version.id)).limit(1);
    expect(sqlStateOf(await rejection(db.update(treeNodes).set({ title: "Changed behind its back" }).where(eq(treeNodes.id, node.id))))).toBe("RB001");
    expect(sqlStateOf(await rejection(db.delete(treeOptions).where(eq(treeOptions.id, option.id))))).toBe("RB001");
    expect(sqlStateOf(await rejection(db.insert(optionEvidence).values({ optionId: option.id, causeId: 1, strength: "for" })))).toBe("RB001");
    expect(sqlStateOf(await rejection(db.update(treeVersions).set({ note: "rewritten" }).where(eq(treeVersions.id, version.id))))).toBe("RB001");
    const [still] = await db.select().from(treeNodes).where(eq(treeNodes.id, node.id));
    expect(still.title).toBe(node.title);
  });

  it("a save aimed at a published version is a conflict and writes nothing", async () => {
    const [published] = await db.select().from(treeVersions).where(sql`${treeVersions.state} = 'published' and ${treeVersions.number} = 2`);
    const rows = await countRows("tree_nodes");
    const result = await save(senior, published.id, published.revision, { rootKey: null, causes: [], nodes: [], options: [] });
    expect(result.ok).toBe(false);
    if (!result.ok) expect([result.status, result.error]).toEqual([409, "Version 2 has been published and is frozen. Reload to start a new draft from it."]);
    expect(await countRows("tree_nodes")).toBe(rows);
  });

  it("editing a published tree starts draft number+1 from the latest version; starting again returns the same draft", async () => {
    const { tree, version } = await openDraft("water-cutout", senior);
    expect(version.number).toBe(3);
    const [v2] = await db.select().from(treeVersions).where(sql`${treeVersions.treeId} = ${tree.id} and ${treeVersions.number} = 2`);
    expect(version.basedOnVersionId).toBe(v2.id);
    const again = await executeAction(startDraftAction, { treeId: String(tree.id) }, senior);
    expect(again.ok && again.data.versionId).toBe(version.id);
  });

  it("discarding a draft removes its rows and leaves the published versions", async () => {
    const { tree, version } = await openDraft("water-cutout", senior);
    const nodes = await countRows("tree_nodes");
    const [{ n }] = await db.select({ n: sql<number>`count(*)::int` }).from(treeNodes).where(eq(treeNodes.versionId, version.id));
    const result = await executeAction(discardDraftAction, { versionId: String(version.id) }, senior);
    expect(result.ok && result.data).toEqual({ treeId: tree.id, treeRemoved: false });
    expect(await countRows("tree_nodes")).toBe(nodes - n);
    const left = await db.select({ state: treeVersions.state }).from(treeVersions).where(eq(treeVersions.treeId, tree.id));
    expect(left.map((v) => v.state)).toEqual(["published", "published"]);
  });
});
