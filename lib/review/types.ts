import type { DxSettings, Strength } from "@/lib/diagnosis";

export interface SuggestionView {
  treeId: number;
  versionId: number;
  nodeKey: string;
  nodeTitle: string;
  optionKey: string;
  optionLabel: string;
  causeSlug: string;
  causeName: string;
  authored: number;
  learned: number;
  cases: number;
  currentStrength: Strength;
  proposedStrength: Strength;
  proposedValue: number;
}

export interface VersionReview {
  treeId: number;
  versionId: number;
  versionNumber: number;
  /** Closed cases walked on this version that the learning used. */
  cases: number;
  likelihoods: NonNullable<DxSettings["likelihoods"]>;
  suggestions: SuggestionView[];
}
