import type { NodeKind, StrengthName } from "@/db/schema";

// Copies of the schema's lists, so client code need not import the Drizzle schema module.
export const NODE_KINDS = ["question", "check", "cause", "caution"] as const satisfies readonly NodeKind[];
export const STRENGTHS = ["rules_out", "against", "neutral", "for", "strong"] as const satisfies readonly StrengthName[];

export const KIND_LABELS: Record<NodeKind, string> = {
  question: "Question",
  check: "Check",
  cause: "Cause",
  caution: "Caution",
};

/** What the `prompt` field holds for each kind of node. */
export const PROMPT_LABELS: Record<NodeKind, string> = {
  question: "Wording for the caller",
  check: "Instructions for the technician",
  cause: "Advice when this is the finding",
  caution: "Lead-in line",
};

/** Question and check nodes ask something, so answer options leave them. */
export function asksSomething(kind: NodeKind): boolean {
  return kind === "question" || kind === "check";
}
