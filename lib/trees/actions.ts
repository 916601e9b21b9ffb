import "server-only";
import { and, desc, eq, max } from "drizzle-orm";
import { z } from "zod";
import { db, type Tx } from "@/db";
import { motorFamilies, trees, treeScope, treeVersions, users } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { slugSchema } from "@/lib/trees/file/schema";
import { causeOptions } from "@/lib/catalogue/queries";
import { AppError } from "@/lib/errors";
import { sqlState } from "@/lib/trees/sql-state";
import { staleDraftMessage } from "./conflict";
import { draftGraphSchema, emptyDraft, graphToDraft } from "./draft";
import { loadGraph, writeGraph } from "./graph";
import { treeProblems, type TreeProblem } from "./problems";

const id = z.coerce.number({ error: "No id given." }).int().positive("No id given.");
const revision = z.coerce.number().int().nonnegative();

/** Repeated form fields arrive as an array, a single one as a string, none as undefined. */
const list = <T extends z.ZodType>(item: T) =>
  z.preprocess((v) => (v === undefined || v === "" ? [] : Array.isArray(v) ? v : [v]), z.array(item));

const jsonOrObject = <T extends z.ZodType>(schema: T) =>
  z.preprocess((v) => {
    if (typeof v !== "string") return v;
    try {
      return JSON.parse(v);
    } catch {
      return undefined;
    }
  }, schema);

export const treeDetailsFields = {
  symptom: z.string().trim().min(1, "Name the reported symptom.").max(120, "Keep the symptom under 120 characters."),
  title: z.string().trim().min(1, "Give the tree a title.").max(200, "Keep the title under 200 characters."),
  description: z.string().trim().max(2000, "Keep the description under 2,000 characters."),
  scope: list(slugSchema),
};

async function familyIds(tx: Tx, slugs: string[]): Promise<number[]> {
  if (!slugs.length) return [];
  const rows = await tx.select({ id: motorFamilies.id, slug: motorFamilies.slug }).from(motorFamilies);
  const idOf = new Map(rows.map((r) => [r.slug, r.id]));
  const unknown = slugs.filter((s) => !idOf.has(s));
  if (unknown.length) throw new AppError("invalid", `Unknown motor family: ${unknown.join(", ")}.`, { fieldErrors: { scope: "Pick families from the list." } });
  return [...new Set(slugs)].map((s) => idOf.get(s)!);
}

async function setScope(tx: Tx, treeId: number, slugs: string[]) {
  const ids = await familyIds(tx, slugs);
  await tx.delete(treeScope).where(eq(treeScope.treeId, treeId));
  if (ids.length) await tx.insert(treeScope).values(ids.map((familyId) => ({ treeId, familyId })));
}

export const createTreeAction = defineAction({
  name: "trees.create",
  access: "tree:edit",
  input: z.object({ slug: z.string().trim().pipe(slugSchema.max(80, "Keep the slug under 80 characters.")), ...treeDetailsFields }),
  async run(input, { user }) {
    try {
      const created = await db.transaction(async (tx) => {
        const [tree] = await tx
          .insert(trees)
          .values({ slug: input.slug, symptom: input.symptom, title: input.title, description: input.description, createdBy: user.id })
          .returning({ id: trees.id });
        await setScope(tx, tree.id, input.scope);
        const [version] = await tx
          .insert(treeVersions)
          .values({ treeId: tree.id, number: 1, state: "draft", editedBy: user.id, note: "Started from nothing" })
          .returning({ id: treeVersions.id });
        await writeGraph(tx, version.id, emptyDraft());
        return { treeId: tree.id, versionId: version.id };
      });
      return { ok: true as const, data: created, message: "Tree created; its first draft is open." };
    } catch (error) {
      if (sqlState(error) === "23505") throw new AppError("conflict", "Another tree already uses that slug.", { fieldErrors: { slug: "Already in use." } });
      throw error;
    }
  },
});

export const updateTreeDetailsAction = defineAction({
  name: "trees.updateDetails",
  access: "tree:edit",
  input: z.object({ treeId: id, ...treeDetailsFields }),
  async run(input) {
    await db.transaction(async (tx) => {
      const [tree] = await tx.select({ id: trees.id }).from(trees).where(eq(trees.id, input.treeId)).for("update");
      if (!tree) throw new AppError("not_found", "That tree does not exist.");
      await tx.update(trees).set({ symptom: input.symptom, title: input.title, description: input.description }).where(eq(trees.id, tree.id));
      await setScope(tx, tree.id, input.scope);
    });
    return { ok: true as const, data: { treeId: input.treeId }, message: "Details saved." };
  },
});

async function lockVersion(tx: Tx, versionId: number) {
  const [version] = await tx.select().from(treeVersions).where(eq(treeVersions.id, versionId)).for("update");
  if (!version) throw new AppError("not_found", "That tree version does not exist.");
  return version;
}

async function assertCurrentDraft(tx: Tx, version: Awaited<ReturnType<typeof lockVersion>>, loadedRevision: number) {
  if (version.state !== "draft") {
    throw new AppError("conflict", `Version ${version.number} has been published and is frozen. Reload to start a new draft from it.`);
  }
  if (version.revision !== loadedRevision) {
    const [editor] = version.editedBy ? await tx.select({ name: users.name }).from(users).where(eq(users.id, version.editedBy)) : [];
    throw new AppError("conflict", staleDraftMessage(editor?.name ?? null, version.editedAt));
  }
}

export interface SaveDraftResult {
  versionId: number;
  revision: number;
  editedAt: string;
  problems: TreeProblem[];
}

export const saveDraftInput = z.object({ versionId: id, revision, graph: jsonOrObject(draftGraphSchema) });

/**
 * Saves the whole draft graph in one transaction. The version row is locked first, so two saves of
 * one draft queue; the second carries the old revision and is refused as a conflict.
 */
export const saveDraftAction = defineAction({
  name: "trees.saveDraft",
  access: "tree:edit",
  input: saveDraftInput,
  async run(input, { user }): Promise<{ ok: true; data: SaveDraftResult; message: string }> {
    const data = await db.transaction(async (tx) => {
      const version = await lockVersion(tx, input.versionId);
      await assertCurrentDraft(tx, version, input.revision);
      const catalogue = await causeOptions(tx);
      await writeGraph(tx, version.id, input.graph);
      const editedAt = new Date();
      await tx.update(treeVersions).set({ revision: version.revision + 1, editedBy: user.id, editedAt }).where(eq(treeVersions.id, version.id));
      return { versionId: version.id, revision: version.revision + 1, editedAt: editedAt.toISOString(), problems: treeProblems(input.graph, catalogue) };
    });
    const n = data.problems.length;
    return { ok: true, data, message: n ? `Draft saved. ${n} problem${n === 1 ? "" : "s"} to fix before publishing.` : "Draft saved. No problems: ready to publish." };
  },
});

export const publishDraftAction = defineAction({
  name: "trees.publish",
  access: "tree:edit",
  input: z.object({ versionId: id, revision, note: z.string().trim().max(500, "Keep the note under 500 characters.").optional().default("") }),
  async run(input, { user }) {
    const published = await db.transaction(async (tx) => {
      const version = await lockVersion(tx, input.versionId);
      await assertCurrentDraft(tx, version, input.revision);
      const graph = await loadGraph(version.id, tx);
      const problems = treeProblems(graph!, await causeOptions(tx));
      if (problems.length) {
        throw new AppError("invalid", `${problems.length} problem${problems.length === 1 ? "" : "s"} must be fixed before this draft can be published.`);
      }
      const at = new Date();
      await tx
        .update(treeVersions)
        .set({ state: "published", publishedAt: at, publishedBy: user.id, ...(input.note ? { note: input.note } : {}) })
        .where(eq(treeVersions.id, version.id));
      return { treeId: version.treeId, versionId: version.id, number: version.number };
    });
    return { ok: true as const, data: published, message: `Version ${published.number} is published.` };
  },
});

/** Copies the latest published version into a new draft; if a draft exists already, that one is returned. */
export const startDraftAction = defineAction({
  name: "trees.startDraft",
  access: "tree:edit",
  input: z.object({ treeId: id }),
  async run(input, { user }) {
    try {
      const draft = await db.transaction(async (tx) => {
        const [tree] = await tx.select({ id: trees.id }).from(trees).where(eq(trees.id, input.treeId)).for("update");
        if (!tree) throw new AppError("not_found", "That tree does not exist.");
        const [existing] = await tx
          .select({ id: treeVersions.id, number: treeVersions.number })
          .from(treeVersions)
          .where(and(eq(treeVersions.treeId, tree.id), eq(treeVersions.state, "draft")));
        if (existing) return { treeId: tree.id, versionId: existing.id, number: existing.number, existed: true };
        const [latest] = await tx
          .select({ id: treeVersions.id, number: treeVersions.number })
          .from(treeVersions)
          .where(and(eq(treeVersions.treeId, tree.id), eq(treeVersions.state, "published")))
          .orderBy(desc(treeVersions.number))
          .limit(1);
        const [{ top }] = await tx.select({ top: max(treeVersions.number) }).from(treeVersions).where(eq(treeVersions.treeId, tree.id));
        const graph = latest ? await loadGraph(latest.id, tx) : null;
        const number = (top ?? 0) + 1;
        const [version] = await tx
          .insert(treeVersions)
          .values({
            treeId: tree.id, number, state: "draft", basedOnVersionId: latest?.id ?? null, editedBy: user.id,
            note: latest ? `Started from version ${latest.number}` : "Started from nothing",
          })
          .returning({ id: treeVersions.id });
        await writeGraph(tx, version.id, graph ? graphToDraft(graph) : emptyDraft());
        return { treeId: tree.id, versionId: version.id, number, existed: false };
      });
      return { ok: true as const, data: draft, message: draft.existed ? `Draft ${draft.number} was already open.` : `Draft ${draft.number} started.` };
    } catch (error) {
      if (sqlState(error) === "23505") throw new AppError("conflict", "Someone else started a draft of this tree a moment ago; reload to open it.");
      throw error;
    }
  },
});

/** Throws a draft away. A tree that never had anything else goes with it. */
export const discardDraftAction = defineAction({
  name: "trees.discardDraft",
  access: "tree:edit",
  input: z.object({ versionId: id }),
  async run(input) {
    const result = await db.transaction(async (tx) => {
      const version = await lockVersion(tx, input.versionId);
      const [tree] = await tx.select({ id: trees.id }).from(trees).where(eq(trees.id, version.treeId)).for("update");
      if (version.state !== "draft") throw new AppError("conflict", `Version ${version.number} is published and cannot be discarded.`);
      await tx.delete(treeVersions).where(eq(treeVersions.id, version.id));
      const [other] = await tx.select({ id: treeVersions.id }).from(treeVersions).where(eq(treeVersions.treeId, version.treeId)).limit(1);
      if (!other) await tx.delete(trees).where(eq(trees.id, tree.id));
      return { treeId: tree.id, treeRemoved: !other };
    }).catch((error: unknown) => {
      if (sqlState(error) === "23503") throw new AppError("conflict", "Cases refer to this draft, so it cannot be discarded.");
      throw error;
    });
    return { ok: true as const, data: result, message: result.treeRemoved ? "Draft and its new tree discarded." : "Draft discarded." };
  },
});
