import { validateTree, type TreeProblem } from "@/lib/diagnosis";
import { draftToDxTree } from "./dx";
import type { DraftGraph } from "./draft";
import { PROMPT_LABELS } from "./kinds";

export type { TreeProblem };

/** What the problem check needs to know of the catalogue. */
export interface CatalogueCauseRef {
  slug: string;
  inspectMinutes: number;
  active: boolean;
}

const q = (s: string) => JSON.stringify(s);
const PROMPT_NAMES = Object.fromEntries(Object.entries(PROMPT_LABELS).map(([k, v]) => [k, v.toLowerCase()]));

/**
 * Everything that blocks publishing: the engine's validateTree, plus causes missing from (or
 * retired in) the catalogue and wording a caller or technician would see empty. Pure, so the
 * editor can show the same list the server computes on save.
 */
export function treeProblems(draft: DraftGraph, catalogue: readonly CatalogueCauseRef[]): TreeProblem[] {
  const bySlug = new Map(catalogue.map((c) => [c.slug, c]));
  const inspect = new Map(catalogue.map((c) => [c.slug, c.inspectMinutes]));
  const problems: TreeProblem[] = [];

  if (draft.causes.length === 0) {
    problems.push({ code: "no_causes", message: "The tree lists no causes; add at least one in the causes panel" });
  }
  for (const cause of draft.causes) {
    const entry = bySlug.get(cause.slug);
    if (!entry) problems.push({ code: "cause_not_in_catalogue", message: `Cause ${q(cause.slug)} is not in the catalogue` });
    else if (!entry.active) problems.push({ code: "cause_retired", message: `Cause ${q(cause.slug)} is retired in the catalogue` });
  }
  for (const node of draft.nodes) {
    if (node.kind === "cause" && node.causeSlug && !bySlug.has(node.causeSlug)) {
      problems.push({ code: "cause_not_in_catalogue", nodeId: node.key, message: `Cause node ${q(node.key)} links ${q(node.causeSlug)}, which is not in the catalogue` });
    }
    if (!node.title.trim()) problems.push({ code: "missing_text", nodeId: node.key, message: `Node ${q(node.key)} has no title` });
    if (!node.prompt.trim()) problems.push({ code: "missing_text", nodeId: node.key, message: `Node ${q(node.key)} has no ${PROMPT_NAMES[node.kind]}` });
    if (node.kind === "caution" && !node.cautionText.trim()) {
      problems.push({ code: "missing_text", nodeId: node.key, message: `Caution ${q(node.key)} has no caution text` });
    }
  }
  for (const option of draft.options) {
    if (!option.label.trim()) {
      problems.push({ code: "missing_text", nodeId: option.fromKey, optionId: option.key, message: `An answer of node ${q(option.fromKey)} has no label` });
    }
  }
  return [...validateTree(draftToDxTree(draft, inspect)), ...problems];
}

/** Problems grouped by the node they concern (problems on an option count for its node). */
export function problemsByNode(problems: readonly TreeProblem[]): Map<string, TreeProblem[]> {
  const out = new Map<string, TreeProblem[]>();
  for (const p of problems) {
    if (!p.nodeId) continue;
    const list = out.get(p.nodeId) ?? [];
    list.push(p);
    out.set(p.nodeId, list);
  }
  return out;
}
