import "server-only";
import { and, desc, eq, inArray, max } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { causes, motorFamilies, trees, treeScope, treeVersions } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { AppError } from "@/lib/errors";
import { sqlState } from "@/lib/trees/sql-state";
import { parseTreeFileText, TREE_FILE_MAX_BYTES, type FileProblem, type TreeFile } from "@/lib/trees/file/parse";
import { treeFileToGraphInput } from "./file/convert";
import { writeGraph } from "./graph";

/** Problems only the database can see: causes and families the catalogue does not have, a slug taken. */
async function catalogueProblems(file: TreeFile): Promise<FileProblem[]> {
  const problems: FileProblem[] = [];
  const slugs = new Set<string>([
    ...file.causes.map((c) => c.cause),
    ...file.nodes.flatMap((n) => (n.kind === "cause" ? [n.cause] : [])),
    ...file.options.flatMap((o) => Object.keys(o.evidence)),
  ]);
  const known = new Set(
    slugs.size ? (await db.select({ slug: causes.slug }).from(causes).where(inArray(causes.slug, [...slugs]))).map((r) => r.slug) : [],
  );
  const unknown = (slug: string) => !known.has(slug);
  file.causes.forEach((c, i) => { if (unknown(c.cause)) problems.push({ path: `causes[${i}].cause`, message: `"${c.cause}" is not in the cause catalogue` }); });
  file.nodes.forEach((n, i) => { if (n.kind === "cause" && unknown(n.cause)) problems.push({ path: `nodes[${i}].cause`, message: `"${n.cause}" is not in the cause catalogue` }); });
  file.options.forEach((o, i) => {
    for (const slug of Object.keys(o.evidence)) {
      if (unknown(slug)) problems.push({ path: `options[${i}].evidence.${slug}`, message: `"${slug}" is not in the cause catalogue` });
    }
  });
  if (file.scope.length) {
    const families = new Set((await db.select({ slug: motorFamilies.slug }).from(motorFamilies).where(inArray(motorFamilies.slug, file.scope))).map((r) => r.slug));
    file.scope.forEach((slug, i) => { if (!families.has(slug)) problems.push({ path: `scope[${i}]`, message: `"${slug}" is not a known motor family` }); });
  }
  return problems;
}

function refuse(problems: FileProblem[]): never {
  const fieldErrors: Record<string, string> = {};
  for (const p of problems) {
    const key = p.path || "file";
    fieldErrors[key] = fieldErrors[key] ? `${fieldErrors[key]}; ${p.message}` : p.message;
  }
  throw new AppError("invalid", `The file has ${problems.length} problem${problems.length === 1 ? "" : "s"}; nothing was imported.`, { fieldErrors });
}

const fileField = z.union([z.instanceof(File), z.string()], { error: "Choose a tree file to import." });

export const importTreeInput = z.object({
  file: fileField,
  asNewDraft: z.preprocess((v) => v === "on" || v === "true" || v === true, z.boolean()),
});

/**
 * Imports a tree file: a new tree with its first draft, or (when asked) a new draft of the tree
 * with the same slug. Any problem refuses the whole file, listed by JSON path; nothing is written.
 */
export const importTreeAction = defineAction({
  name: "trees.import",
  access: "tree:edit",
  input: importTreeInput,
  async run(input, { user }) {
    if (typeof input.file !== "string" && input.file.size === 0) refuse([{ path: "", message: "Choose a tree file to import." }]);
    if (typeof input.file !== "string" && input.file.size > TREE_FILE_MAX_BYTES) refuse([{ path: "", message: "The file is larger than 2 MB." }]);
    const text = typeof input.file === "string" ? input.file : await input.file.text();
    const parsed = parseTreeFileText(text);
    if (!parsed.ok) refuse(parsed.problems);
    const file = parsed.file;
    const problems = await catalogueProblems(file);
    const [existing] = await db.select({ id: trees.id }).from(trees).where(eq(trees.slug, file.slug)).limit(1);
    if (existing && !input.asNewDraft) {
      problems.push({ path: "slug", message: `a tree with the slug "${file.slug}" exists; tick "new draft of the existing tree" or change the slug in the file` });
    }
    if (problems.length) refuse(problems);

    try {
      const result = await db.transaction(async (tx) => {
        let treeId: number;
        let number = 1;
        let basedOn: number | null = null;
        if (existing) {
          const [tree] = await tx.select({ id: trees.id }).from(trees).where(eq(trees.id, existing.id)).for("update");
          treeId = tree.id;
          const [draft] = await tx.select({ number: treeVersions.number }).from(treeVersions)
            .where(and(eq(treeVersions.treeId, treeId), eq(treeVersions.state, "draft")));
          if (draft) refuse([{ path: "slug", message: `tree "${file.slug}" already has a draft (version ${draft.number}); publish or discard it first` }]);
          const [{ top }] = await tx.select({ top: max(treeVersions.number) }).from(treeVersions).where(eq(treeVersions.treeId, treeId));
          const [latest] = await tx.select({ id: treeVersions.id }).from(treeVersions)
            .where(and(eq(treeVersions.treeId, treeId), eq(treeVersions.state, "published"))).orderBy(desc(treeVersions.number)).limit(1);
          number = (top ?? 0) + 1;
          basedOn = latest?.id ?? null;
        } else {
          const [tree] = await tx
            .insert(trees)
            .values({ slug: file.slug, symptom: file.symptom, title: file.title, description: file.description, createdBy: user.id })
            .returning({ id: trees.id });
          treeId = tree.id;
          if (file.scope.length) {
            const families = await tx.select({ id: motorFamilies.id }).from(motorFamilies).where(inArray(motorFamilies.slug, file.scope));
            await tx.insert(treeScope).values(families.map((f) => ({ treeId, familyId: f.id })));
          }
        }
        const [version] = await tx
          .insert(treeVersions)
          .values({ treeId, number, state: "draft", basedOnVersionId: basedOn, editedBy: user.id, note: "Imported from a tree file" })
          .returning({ id: treeVersions.id });
        await writeGraph(tx, version.id, treeFileToGraphInput(file));
        return { treeId, versionId: version.id, number, created: !existing };
      });
      return {
        ok: true as const, data: result,
        message: result.created ? `Imported "${file.title}" as a new tree.` : `Imported as draft ${result.number} of the existing tree; its details were kept.`,
      };
    } catch (error) {
      if (sqlState(error) === "23505") throw new AppError("conflict", "Someone created a tree or draft with this slug a moment ago; try again.");
      throw error;
    }
  },
});
