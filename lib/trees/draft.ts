import { z } from "zod";
import { slugSchema, strengthSchema } from "@/lib/trees/file/schema";
import { NODE_KINDS } from "./kinds";
import type { GraphInput } from "./graph-types";

/** The graph the editor holds and a save sends: a GraphInput, checked against these limits. */
export type DraftGraph = GraphInput;
export type DraftNode = DraftGraph["nodes"][number];
export type DraftOption = DraftGraph["options"][number];
export type DraftCause = DraftGraph["causes"][number];

export const DRAFT_LIMITS = {
  nodes: 2000,
  options: 6000,
  causes: 200,
  title: 80,
  label: 120,
  prompt: 4000,
  caution: 4000,
  costMinutes: 24 * 60,
  priorWeight: 1000,
  position: 1_000_000,
} as const;

const text = (max: number, what: string) => z.string().max(max, `Keep the ${what} under ${max} characters.`);
const coordinate = z.number().finite().min(-DRAFT_LIMITS.position).max(DRAFT_LIMITS.position);

export const draftNodeSchema = z.strictObject({
  key: slugSchema,
  kind: z.enum(NODE_KINDS),
  title: text(DRAFT_LIMITS.title, "title"),
  prompt: text(DRAFT_LIMITS.prompt, "caller-facing wording"),
  costMinutes: z.number().int("Use whole minutes.").min(1, "A check costs at least 1 minute.").max(DRAFT_LIMITS.costMinutes),
  needsOpening: z.boolean(),
  causeSlug: slugSchema.nullable(),
  cautionText: text(DRAFT_LIMITS.caution, "caution text"),
  posX: coordinate,
  posY: coordinate,
});

export const draftOptionSchema = z.strictObject({
  key: slugSchema,
  fromKey: slugSchema,
  toKey: slugSchema.nullable(),
  label: text(DRAFT_LIMITS.label, "answer label"),
  dontKnow: z.boolean(),
  evidence: z.record(slugSchema, strengthSchema).refine((e) => Object.keys(e).length <= DRAFT_LIMITS.causes, "Too many evidence entries."),
});

export const draftCauseSchema = z.strictObject({
  slug: slugSchema,
  priorWeight: z.number().finite().min(0, "A prior weight is 0 or more.").max(DRAFT_LIMITS.priorWeight),
});

export const draftGraphSchema = z
  .strictObject({
    rootKey: slugSchema.nullable(),
    causes: z.array(draftCauseSchema).max(DRAFT_LIMITS.causes, `At most ${DRAFT_LIMITS.causes} causes per tree.`),
    nodes: z.array(draftNodeSchema).max(DRAFT_LIMITS.nodes, `At most ${DRAFT_LIMITS.nodes} nodes per tree.`),
    options: z.array(draftOptionSchema).max(DRAFT_LIMITS.options, `At most ${DRAFT_LIMITS.options} answer options per tree.`),
  })
  .superRefine((graph, ctx) => {
    // The database keys nodes and options by (version, key); duplicates could not be stored.
    const dup = (items: { key: string }[], path: "nodes" | "options") => {
      const seen = new Set<string>();
      items.forEach((item, i) => {
        if (seen.has(item.key)) ctx.addIssue({ code: "custom", path: [path, i, "key"], message: `The key "${item.key}" is used twice.` });
        seen.add(item.key);
      });
    };
    dup(graph.nodes, "nodes");
    dup(graph.options, "options");
    const causes = new Set<string>();
    graph.causes.forEach((c, i) => {
      if (causes.has(c.slug)) ctx.addIssue({ code: "custom", path: ["causes", i, "slug"], message: `The cause "${c.slug}" is listed twice.` });
      causes.add(c.slug);
    });
    const nodes = new Set(graph.nodes.map((n) => n.key));
    graph.options.forEach((o, i) => {
      if (!nodes.has(o.fromKey)) ctx.addIssue({ code: "custom", path: ["options", i, "fromKey"], message: `Answer "${o.key}" leaves node "${o.fromKey}", which is not in the graph.` });
      if (o.toKey !== null && !nodes.has(o.toKey)) ctx.addIssue({ code: "custom", path: ["options", i, "toKey"], message: `Answer "${o.key}" leads to node "${o.toKey}", which is not in the graph.` });
    });
  });

/** An empty draft, as a new tree starts. */
export function emptyDraft(): DraftGraph {
  return { rootKey: null, causes: [], nodes: [], options: [] };
}

/** Strips ids and sort orders from a loaded graph: what the editor starts from. */
export function graphToDraft(graph: DraftGraph): DraftGraph {
  return {
    rootKey: graph.rootKey,
    causes: graph.causes.map((c) => ({ slug: c.slug, priorWeight: c.priorWeight })),
    nodes: graph.nodes.map((n) => ({
      key: n.key, kind: n.kind, title: n.title, prompt: n.prompt, costMinutes: n.costMinutes, needsOpening: n.needsOpening,
      causeSlug: n.causeSlug, cautionText: n.cautionText, posX: n.posX, posY: n.posY,
    })),
    options: graph.options.map((o) => ({
      key: o.key, fromKey: o.fromKey, toKey: o.toKey, label: o.label, dontKnow: o.dontKnow, evidence: { ...o.evidence },
    })),
  };
}
