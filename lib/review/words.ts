import { percent as pct, whole } from "@/lib/format";
import { STRENGTH_LABELS } from "@/lib/trees/kinds";
import type { SuggestionView } from "./types";


type Said = Pick<SuggestionView, "causeName" | "nodeTitle" | "cases" | "rows" | "optionKey">;

/** The column in plain words, as a senior mechanic reads it: the answer that differs most, seen against the tree. */
export function suggestionSentence(s: Said): string {
  const row = s.rows.find((r) => r.optionKey === s.optionKey)!;
  return `${s.cases} closed case${s.cases === 1 ? "" : "s"} of “${s.causeName}” answered “${s.nodeTitle}”; “${row.optionLabel}” came ${row.count} time${row.count === 1 ? "" : "s"} (${pct(row.count / Math.max(1, s.cases))}) where the tree expects ${pct(row.authored)}.`;
}

/**
 * How sure the shop can be, from the Bayes factor B of "the answers follow another distribution"
 * against "they follow the tree", in the words of Kass & Raftery ("Bayes factors", JASA 1995,
 * p. 777): up to 3 barely worth mentioning, 3–20 positive, 20–150 strong, above 150 very strong.
 * The share is B / (1 + B), the probability that the tree is off here for someone who thought it
 * even odds before seeing the cases.
 */
export function certaintySentence(logBayesFactor: number): string {
  const b = Math.exp(logBayesFactor);
  const grade = b > 150 ? "very strong" : b > 20 ? "strong" : b > 3 ? "positive" : "weak";
  const times = b >= 1e6 ? "over a million" : whole.format(Math.round(b));
  const sure = b >= 1e6 ? "over 99.9999 %" : `${(100 * (b / (1 + b))).toFixed(b > 999 ? 2 : 1)} %`;
  return `These answers are ${times} times likelier if the tree is off here than if it is right: ${grade} evidence (${sure} sure, from even odds).`;
}

export function proposalSentence(s: Pick<SuggestionView, "rows" | "optionKey" | "currentStrength" | "proposedStrength" | "proposedColumn">): string {
  if (s.currentStrength === s.proposedStrength) {
    return "No single change of strength brings the tree nearer the shop's history; the question's other answers need a look.";
  }
  const i = s.rows.findIndex((r) => r.optionKey === s.optionKey);
  return `Change “${s.rows[i].optionLabel}” from “${STRENGTH_LABELS[s.currentStrength]}” to “${STRENGTH_LABELS[s.proposedStrength]}” (the tree would then expect ${pct(s.proposedColumn[i])}).`;
}

/** Why the learned values lean as far toward the history as they do. */
export function strengthSentence(s: Pick<SuggestionView, "strength" | "strengthFrom" | "cases">): string {
  if (s.strength === Infinity) return "The learned values keep the tree's.";
  const weight = `the tree counts as ${s.strength < 10 ? s.strength.toFixed(1) : Math.round(s.strength)} cases against the shop's ${s.cases}`;
  return s.strengthFrom === "column"
    ? `Learned from this question's own history: ${weight}.`
    : s.strengthFrom === "tree" ? `Learned with the pull the whole tree's history supports: ${weight}.` : `Learned with a fixed pull: ${weight}.`;
}
