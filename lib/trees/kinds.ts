import type { NodeKind, StrengthName } from "@/db/schema";

// A copy of the schema's list, so client code need not import the Drizzle schema module.
export const NODE_KINDS = ["question", "check", "cause", "caution"] as const satisfies readonly NodeKind[];

export const STRENGTH_LABELS: Record<StrengthName, string> = {
  rules_out: "rules out",
  against: "against",
  neutral: "neutral",
  for: "for",
  strong: "strong",
};

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
