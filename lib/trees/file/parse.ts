import type { z } from "zod";
import { treeFileSchema, type TreeFile } from "@/lib/trees/file/schema";
import { draftGraphSchema } from "@/lib/trees/draft";
import { treeFileToGraphInput } from "@/lib/trees/file/convert";

/**
 * The tree file: Rootbench's own JSON format for importing and exporting a symptom tree.
 * The zod schema lives in schema.ts beside this module (the demo trees use it too); the format is
 * described for people in format.md. This module adds what an upload
 * needs: JSON syntax errors, readable messages, each with the JSON path it concerns, and the
 * cross-references a schema alone cannot check (keys unique, answers leading to real nodes).
 */
export { treeFileSchema, type TreeFile };

export const TREE_FILE_MAX_BYTES = 2 * 1024 * 1024;

export interface FileProblem {
  /** Where in the file, like `nodes[3].title`; empty for the file as a whole. */
  path: string;
  message: string;
}

export type TreeFileParse = { ok: true; file: TreeFile } | { ok: false; problems: FileProblem[] };

export function formatPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const part of path) {
    if (typeof part === "number") out += `[${part}]`;
    else out += out ? `.${String(part)}` : String(part);
  }
  return out;
}

function messageOf(issue: z.core.$ZodIssue): string {
  switch (issue.code) {
    case "invalid_type":
      return issue.input === undefined ? `is missing (expected ${issue.expected})` : `should be ${issue.expected === "array" ? "a list" : `a ${issue.expected}`}`;
    case "too_small":
      if (issue.origin === "string" && Number(issue.minimum) === 1) return "must not be empty";
      if (issue.origin === "array") return `needs at least ${String(issue.minimum)} item${Number(issue.minimum) === 1 ? "" : "s"}`;
      return `must be at least ${String(issue.minimum)}`;
    case "too_big":
      return issue.origin === "string" ? `is longer than ${String(issue.maximum)} characters` : `must be at most ${String(issue.maximum)}`;
    case "unrecognized_keys":
      return `has field${issue.keys.length > 1 ? "s" : ""} the format does not know: ${issue.keys.join(", ")}`;
    case "invalid_union":
      return "kind must be one of question, check, cause, caution";
    case "invalid_format":
      return `must be ${issue.message}`;
    default:
      return issue.message;
  }
}

export function issuesToProblems(issues: readonly z.core.$ZodIssue[], rename: (path: string) => string = (p) => p): FileProblem[] {
  return issues.map((issue) => ({ path: rename(formatPath(issue.path)), message: messageOf(issue) }));
}

/** Problems a stored graph could not hold: repeated keys, answers from or to missing nodes, an unknown root. */
export function treeFileReferenceProblems(file: TreeFile): FileProblem[] {
  const problems: FileProblem[] = [];
  const firstIndex = (items: string[], path: string, what: string) => {
    const seen = new Map<string, number>();
    items.forEach((item, i) => {
      const earlier = seen.get(item);
      if (earlier !== undefined) problems.push({ path: `${path}[${i}]`, message: `repeats the ${what} "${item}" of ${path}[${earlier}]` });
      else seen.set(item, i);
    });
  };
  firstIndex(file.nodes.map((n) => n.key), "nodes", "key");
  firstIndex(file.options.map((o) => o.key), "options", "key");
  firstIndex(file.causes.map((c) => c.cause), "causes", "cause");
  const nodes = new Set(file.nodes.map((n) => n.key));
  if (!nodes.has(file.rootKey)) problems.push({ path: "rootKey", message: `names "${file.rootKey}", which is not a node of this file` });
  file.options.forEach((o, i) => {
    if (!nodes.has(o.from)) problems.push({ path: `options[${i}].from`, message: `names "${o.from}", which is not a node of this file` });
    if (o.to !== null && !nodes.has(o.to)) problems.push({ path: `options[${i}].to`, message: `names "${o.to}", which is not a node of this file` });
  });
  return problems;
}

// The editor's size limits use the graph's field names; report them under the file's names.
const FILE_NAMES: [RegExp, string][] = [
  [/^(nodes\[\d+\])\.cautionText$/, "$1.caution"],
  [/^(nodes\[\d+\])\.causeSlug$/, "$1.cause"],
  [/^(nodes\[\d+\])\.pos([XY])$/, "$1.position"],
  [/^(options\[\d+\])\.fromKey$/, "$1.from"],
  [/^(options\[\d+\])\.toKey$/, "$1.to"],
  [/^(causes\[\d+\])\.slug$/, "$1.cause"],
];
const toFileName = (path: string) => FILE_NAMES.reduce((p, [re, to]) => p.replace(re, to), path);

/** Reads an uploaded file's text: JSON, then the schema, then references and the editor's limits. */
export function parseTreeFileText(text: string): TreeFileParse {
  if (new TextEncoder().encode(text).length > TREE_FILE_MAX_BYTES) {
    return { ok: false, problems: [{ path: "", message: `The file is larger than ${TREE_FILE_MAX_BYTES / 1024 / 1024} MB.` }] };
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    return { ok: false, problems: [{ path: "", message: `This is not valid JSON: ${error instanceof Error ? error.message : String(error)}` }] };
  }
  const parsed = treeFileSchema.safeParse(json);
  if (!parsed.success) return { ok: false, problems: issuesToProblems(parsed.error.issues) };
  const references = treeFileReferenceProblems(parsed.data);
  if (references.length) return { ok: false, problems: references };
  const limits = draftGraphSchema.safeParse(treeFileToGraphInput(parsed.data));
  if (!limits.success) return { ok: false, problems: issuesToProblems(limits.error.issues, toFileName) };
  return { ok: true, file: parsed.data };
}
