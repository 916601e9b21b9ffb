import { STRENGTH_LABELS } from "@/lib/trees/kinds";
import type { SuggestionView } from "./types";

const p2 = (x: number) => x.toFixed(2);

/** The suggestion in plain words, as a senior mechanic reads it. */
export function suggestionSentence(s: Pick<SuggestionView, "optionLabel" | "causeName" | "authored" | "learned" | "cases">): string {
  return `Answer “${s.optionLabel}” → “${s.causeName}”: the tree says ${p2(s.authored)}, shop history ${p2(s.learned)} over ${s.cases} case${s.cases === 1 ? "" : "s"}.`;
}

export function proposalSentence(s: Pick<SuggestionView, "currentStrength" | "proposedStrength" | "proposedValue">): string {
  if (s.currentStrength === s.proposedStrength) {
    return `No single strength on this answer comes nearer than “${STRENGTH_LABELS[s.currentStrength]}”; the node's other answers need a look.`;
  }
  return `Change “${STRENGTH_LABELS[s.currentStrength]}” to “${STRENGTH_LABELS[s.proposedStrength]}” (the tree would then say ${p2(s.proposedValue)}).`;
}
