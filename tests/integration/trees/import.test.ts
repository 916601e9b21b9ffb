import { readFileSync } from "node:fs";
import path from "node:path";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { treeScope, treeVersions } from "@/db/schema";
import { executeAction } from "@/lib/actions/define";
import type { SessionUser } from "@/lib/auth/session-user";
import { importTreeAction } from "@/lib/trees/import";
import { graphToDraft } from "@/lib/trees/draft";
import { treeFileToGraphInput } from "@/lib/trees/file/convert";
import { loadGraph } from "@/lib/trees/graph";
import type { TreeFile } from "@/lib/trees/file/parse";
import { countRows, createUser } from "../../support/db";
import { resetToDemo } from "../../support/seed";
import { openDraft, treeBySlug } from "./helpers";

const TABLES = ["trees", "tree_scope", "tree_versions", "tree_causes", "tree_nodes", "tree_options", "option_evidence"];
const counts = async () => Object.fromEntries(await Promise.all(TABLES.map(async (t) => [t, await countRows(t)] as const)));
const demoFile = (): TreeFile => JSON.parse(readFileSync(path.resolve(__dirname, "../../../content/trees/no-power.json"), "utf8"));
const upload = (value: unknown, name = "tree.json") => new File([typeof value === "string" ? value : JSON.stringify(value)], name, { type: "application/json" });

describe("importing a tree file", () => {
  let senior: SessionUser;
  beforeAll(async () => {
    await resetToDemo();
    senior = await createUser("senior");
  });

  it("a bad file lists its problems by JSON path and writes nothing", async () => {
    const before = await counts();
    const file = demoFile() as unknown as { slug: string; nodes: Record<string, unknown>[]; options: { to: string | null; evidence: Record<string, string> }[]; causes: { cause: string }[] };
    file.slug = "imported-bad";
    file.nodes[1].title = "";
    file.options[2].to = "no-such-node";
    const result = await executeAction(importTreeAction, { file: upload(file) }, senior);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.status).toBe(422);
      expect(result.fieldErrors).toEqual({ "nodes[1].title": "must not be empty" });
    }
    // References are checked once the schema passes.
    file.nodes[1].title = "Fixed";
    const second = await executeAction(importTreeAction, { file: upload(file) }, senior);
    expect(!second.ok && second.fieldErrors).toEqual({ "options[2].to": 'names "no-such-node", which is not a node of this file' });
    // Catalogue references: the database is consulted, still nothing written.
    file.options[2].to = null;
    file.causes[0].cause = "invented-elsewhere";
    file.options[0].evidence = { "invented-elsewhere": "for" };
    const third = await executeAction(importTreeAction, { file: upload(file) }, senior);
    expect(!third.ok && third.fieldErrors).toEqual({
      "causes[0].cause": '"invented-elsewhere" is not in the cause catalogue',
      "options[0].evidence.invented-elsewhere": '"invented-elsewhere" is not in the cause catalogue',
    });
    const notJson = await executeAction(importTreeAction, { file: upload("{ not json") }, senior);
    expect(!notJson.ok && notJson.status).toBe(422);
    expect(await counts()).toEqual(before);
  });

  it("a good file becomes a new tree with a draft holding the same graph", async () => {
    const file = { ...demoFile(), slug: "no-power-copy", scope: ["orvanta-tessel-2"] };
    const result = await executeAction(importTreeAction, { file: upload(file) }, senior);
    expect(result.ok, JSON.stringify(result)).toBe(true);
    if (!result.ok) return;
    expect(result.data.created).toBe(true);
    const graph = graphToDraft((await loadGraph(result.data.versionId))!);
    const expected = treeFileToGraphInput(file);
    expect(graph.options).toEqual(expected.options);
    expect(graph.nodes.length).toBe(expected.nodes.length);
    expect(await db.select().from(treeScope).where(eq(treeScope.treeId, result.data.treeId))).toHaveLength(1);
  });

  it("an existing slug is refused unless the importer asks for a new draft; a second draft is refused", async () => {
    const before = await counts();
    const file = demoFile();
    const refused = await executeAction(importTreeAction, { file: upload(file) }, senior);
    expect(!refused.ok && Object.keys(refused.fieldErrors ?? {})).toEqual(["slug"]);
    expect(await counts()).toEqual(before);

    const asDraft = await executeAction(importTreeAction, { file: upload(file), asNewDraft: "on" }, senior);
    expect(asDraft.ok, JSON.stringify(asDraft)).toBe(true);
    const tree = await treeBySlug("no-power");
    const versions = await db.select().from(treeVersions).where(eq(treeVersions.treeId, tree.id));
    expect(versions.map((v) => [v.number, v.state]).sort()).toEqual([[1, "published"], [2, "draft"]]);
    expect(versions.find((v) => v.number === 2)?.basedOnVersionId).toBe(versions.find((v) => v.number === 1)?.id);

    const mid = await counts();
    const again = await executeAction(importTreeAction, { file: upload(file), asNewDraft: "on" }, senior);
    expect(!again.ok && again.fieldErrors?.slug).toMatch(/already has a draft \(version 2\)/);
    expect(await counts()).toEqual(mid);
  });

  it("an exported version imports back as an equal graph", async () => {
    const { GET } = await import("@/app/api/trees/[id]/export/route");
    const { request, params } = await import("../../support/requests");
    const { createSession } = await import("@/lib/auth/session");
    const { token } = await createSession(senior.id);
    const tree = await treeBySlug("weak-assist");
    const response = await GET(request(`/api/trees/${tree.id}/export?version=1`, { token }), params({ id: String(tree.id) }));
    expect(response.status).toBe(200);
    expect(response.headers.get("content-disposition")).toBe('attachment; filename="weak-assist-v1.json"');
    const text = await response.text();
    const file = { ...JSON.parse(text), slug: "weak-assist-again" };
    const result = await executeAction(importTreeAction, { file: upload(file) }, senior);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const { graph } = await openDraft("weak-assist", senior);
    const back = graphToDraft((await loadGraph(result.data.versionId))!);
    expect(back.options).toEqual(graph.options);
    expect(back.nodes.map((n) => ({ ...n }))).toEqual(graph.nodes);
  });
});
