import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { treeVersions } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import type { SessionUser } from "@/lib/auth/session-user";
import { createTreeAction } from "@/lib/trees/actions";
import { graphToDraft } from "@/lib/trees/draft";
import { loadGraph } from "@/lib/trees/graph";
import { addNode, addOption, moveNodes, setEvidence, setPriorWeight, updateNode } from "@/lib/trees/ops";
import { countRows, createUser } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { openDraft, save } from "./helpers";

describe("saving a draft", () => {
  let senior: SessionUser;
  beforeAll(async () => {
    await resetToDemo();
    senior = await createUser("senior", { name: "Ilse Marrow" });
  });

  it("start a new draft copies the published version row for row", async () => {
    const { version, graph, tree } = await openDraft("pedal-slip", senior);
    expect(version.number).toBe(2);
    const [published] = await db.select().from(treeVersions).where(and(eq(treeVersions.treeId, tree.id), eq(treeVersions.state, "published")));
    expect(version.basedOnVersionId).toBe(published.id);
    expect(graph).toEqual(graphToDraft((await loadGraph(published.id))!));
  });

  it("save, then reload, gives back exactly the graph that was sent, as rows", async () => {
    const { version, graph } = await openDraft("pedal-slip", senior);
    const nodesBefore = await countRows("tree_nodes");
    let edited = addNode(graph, "check", { x: 120, y: -40 }).draft;
    edited = updateNode(edited, "check-1", { title: "Spin the cranks backwards", prompt: "Unit off; turn the cranks backwards and listen.", costMinutes: 4 });
    const withAnswer = addOption(edited, "check-1", edited.nodes[0].key, "Clicks");
    edited = setEvidence(withAnswer.draft, withAnswer.key, "owc-cage-broken", "strong");
    edited = setPriorWeight(edited, "belt-worn", 3.5);
    edited = moveNodes(edited, new Map([[edited.nodes[1].key, { x: 999, y: 1001 }]]));

    const result = await save(senior, version.id, version.revision, edited);
    expect(result.ok, JSON.stringify(result)).toBe(true);
    if (!result.ok) return;
    expect(result.data.revision).toBe(version.revision + 1);

    const reloaded = graphToDraft((await loadGraph(version.id))!);
    const byKey = <T extends { key: string }>(xs: T[]) => [...xs].sort((a, b) => a.key.localeCompare(b.key));
    expect(reloaded.rootKey).toBe(edited.rootKey);
    expect(byKey(reloaded.nodes)).toEqual(byKey(edited.nodes));
    expect(reloaded.options).toEqual(edited.options);
    expect([...reloaded.causes].sort((a, b) => a.slug.localeCompare(b.slug))).toEqual([...edited.causes].sort((a, b) => a.slug.localeCompare(b.slug)));
    expect(await countRows("tree_nodes")).toBe(nodesBefore + 1);

    const [row] = await db.select().from(treeVersions).where(eq(treeVersions.id, version.id));
    expect([row.revision, row.editedBy]).toEqual([version.revision + 1, senior.id]);
  });

  it("returns the validation problems of what was saved, and saving with problems is allowed", async () => {
    const { version, graph } = await openDraft("pedal-slip", senior);
    const current = (await db.select().from(treeVersions).where(eq(treeVersions.id, version.id)))[0];
    const lonely = addNode(graph, "question", { x: 0, y: 0 });
    const result = await save(senior, version.id, current.revision, lonely.draft);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const mine = result.data.problems.filter((p) => p.nodeId === lonely.key).map((p) => p.code).sort();
    // A new question has no wording, no answers and nothing leading to it.
    expect(mine).toEqual(["missing_text", "too_few_options", "unreachable"]);
  });

  it("refuses a graph beyond the limits or with a cause the catalogue lacks, writing nothing", async () => {
    const { version, graph } = await openDraft("pedal-slip", senior);
    const current = (await db.select().from(treeVersions).where(eq(treeVersions.id, version.id)))[0];
    const rows = await countRows("tree_nodes");
    const long = updateNode(graph, graph.nodes[0].key, { title: "x".repeat(81) });
    const tooLong = await save(senior, version.id, current.revision, long);
    expect(tooLong.ok).toBe(false);
    if (!tooLong.ok) expect([tooLong.status, Object.keys(tooLong.fieldErrors ?? {})]).toEqual([400, ["graph.nodes.0.title"]]);
    const unknown = updateNode(graph, graph.nodes.find((n) => n.kind === "cause")!.key, { causeSlug: "not-a-cause" });
    const refused = await save(senior, version.id, current.revision, unknown);
    expect(refused.ok).toBe(false);
    if (!refused.ok) expect([refused.status, refused.error]).toEqual([422, "Unknown cause in the catalogue: not-a-cause."]);
    expect(await countRows("tree_nodes")).toBe(rows);
    const [after] = await db.select().from(treeVersions).where(eq(treeVersions.id, version.id));
    expect(after.revision).toBe(current.revision);
  });

  it("a tree started from nothing gets an empty first draft; a taken slug is refused", async () => {
    const made = await executeAction(createTreeAction, { slug: "squeal-on-start", symptom: "Squeal on start", title: "Squeal", description: "" }, senior);
    expect(made.ok).toBe(true);
    if (!made.ok) return;
    const graph = await loadGraph(made.data.versionId);
    expect([graph?.number, graph?.state, graph?.nodes.length, graph?.rootKey]).toEqual([1, "draft", 0, null]);
    const again = await executeAction(createTreeAction, { slug: "squeal-on-start", symptom: "Again", title: "Again", description: "" }, senior);
    expect(again.ok).toBe(false);
    if (!again.ok) expect([again.status, again.fieldErrors?.slug]).toEqual([409, "Already in use."]);
  });
});
