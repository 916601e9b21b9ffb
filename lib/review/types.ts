import type { DxSettings, EvidenceColumn, Strength } from "@/lib/diagnosis";

/** One answer of a reviewed column: what the shop saw, what the tree says, what was learned. */
export interface ColumnRow {
  optionKey: string;
  optionLabel: string;
  count: number;
  authored: number;
  learned: number;
  strength: Strength;
}

/**
 * A question-and-cause column whose answers the shop's history says differ from the tree's, with
 * the one strength change that comes nearest (proposed = current when no single change helps).
 */
export interface SuggestionView {
  treeId: number;
  versionId: number;
  nodeKey: string;
  nodeTitle: string;
  causeSlug: string;
  causeName: string;
  cases: number;
  rows: ColumnRow[];
  /** Natural log of the Bayes factor "the answers follow another distribution" against "they follow the tree". */
  logBayesFactor: number;
  strength: number;
  strengthFrom: EvidenceColumn["strengthFrom"];
  /** The answer the proposal changes (the one furthest from the history when nothing helps). */
  optionKey: string;
  optionLabel: string;
  currentStrength: Strength;
  proposedStrength: Strength;
  /** The column P(o|k) with the proposal made, in row order. */
  proposedColumn: number[];
}

export interface VersionReview {
  treeId: number;
  versionId: number;
  versionNumber: number;
  /** Closed cases walked on this version that the learning used. */
  cases: number;
  /** The strength fitted over the whole tree (Infinity: the history agrees with the tree throughout). */
  treeStrength: number;
  likelihoods: NonNullable<DxSettings["likelihoods"]>;
  suggestions: SuggestionView[];
}
