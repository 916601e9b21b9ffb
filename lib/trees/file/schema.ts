import { z } from "zod";
import { STRENGTHS, type DxTree } from "@/lib/diagnosis";

/**
 * The tree file format (`"format": "rootbench-tree"`), used for the demo content and for
 * importing and exporting trees. Keys and slugs double as ids in the engine's DxTree.
 */

export const slugSchema = z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, "lower-case words joined by hyphens");

export const strengthSchema = z.enum(STRENGTHS);
export type StrengthName = z.infer<typeof strengthSchema>;

const positionSchema = z.strictObject({ x: z.number(), y: z.number() });

const nodeBase = {
  key: slugSchema,
  title: z.string().min(1).max(80),
  prompt: z.string().min(1),
  position: positionSchema,
};

const questionNodeSchema = z.strictObject({
  ...nodeBase,
  kind: z.literal("question"),
  costMinutes: z.number().positive().default(1),
  needsOpening: z.boolean().default(false),
});

const checkNodeSchema = z.strictObject({
  ...nodeBase,
  kind: z.literal("check"),
  costMinutes: z.number().positive(),
  /** A check that needs the unit opened shows the standing caution (DESIGN §7). */
  needsOpening: z.boolean().default(false),
});

const causeNodeSchema = z.strictObject({ ...nodeBase, kind: z.literal("cause"), cause: slugSchema });

const cautionNodeSchema = z.strictObject({ ...nodeBase, kind: z.literal("caution"), caution: z.string().min(1) });

export const treeNodeSchema = z.discriminatedUnion("kind", [questionNodeSchema, checkNodeSchema, causeNodeSchema, cautionNodeSchema]);
export type TreeFileNode = z.infer<typeof treeNodeSchema>;

export const treeOptionSchema = z.strictObject({
  key: slugSchema,
  from: slugSchema,
  to: slugSchema.nullable(),
  label: z.string().min(1).max(120),
  dontKnow: z.boolean().default(false),
  evidence: z.record(slugSchema, strengthSchema).default({}),
});
export type TreeFileOption = z.infer<typeof treeOptionSchema>;

export const treeFileSchema = z.strictObject({
  format: z.literal("rootbench-tree"),
  formatVersion: z.literal(1),
  slug: slugSchema,
  symptom: z.string().min(1),
  title: z.string().min(1),
  description: z.string().min(1),
  /** Motor family slugs; empty means every family. */
  scope: z.array(slugSchema),
  rootKey: slugSchema,
  causes: z.array(z.strictObject({ cause: slugSchema, priorWeight: z.number().nonnegative() })).min(1),
  nodes: z.array(treeNodeSchema).min(1),
  options: z.array(treeOptionSchema),
});
export type TreeFile = z.infer<typeof treeFileSchema>;

/** Converts a parsed tree file to the engine's shape; inspection minutes come from the cause catalogue. */
export function treeFileToDxTree(
  file: TreeFile,
  catalogue: ReadonlyArray<{ slug: string; inspectMinutes: number }> = [],
): DxTree {
  const inspect = new Map(catalogue.map((c) => [c.slug, c.inspectMinutes]));
  return {
    rootId: file.rootKey,
    nodes: file.nodes.map((n) => {
      if (n.kind === "cause") return { id: n.key, kind: n.kind, causeId: n.cause };
      if (n.kind === "caution") return { id: n.key, kind: n.kind };
      return { id: n.key, kind: n.kind, costMinutes: n.costMinutes };
    }),
    options: file.options.map((o) => ({
      id: o.key,
      nodeId: o.from,
      to: o.to,
      label: o.label,
      dontKnow: o.dontKnow,
      evidence: { ...o.evidence },
    })),
    causes: file.causes.map((c) => {
      const minutes = inspect.get(c.cause);
      return minutes === undefined
        ? { id: c.cause, priorWeight: c.priorWeight }
        : { id: c.cause, priorWeight: c.priorWeight, inspectMinutes: minutes };
    }),
  };
}
