/** The five evidence strengths, from "rules out" to "strong". */
export const STRENGTHS = ["rules_out", "against", "neutral", "for", "strong"] as const;
export type Strength = (typeof STRENGTHS)[number];

/** A strength, or a raw non-negative weight; 0 rules the cause out. */
export type Weight = Strength | number;

export interface DxNode {
  id: string;
  kind: "question" | "check" | "cause" | "caution";
  causeId?: string;
  costMinutes?: number;
}

export interface DxOption {
  id: string;
  nodeId: string;
  to: string | null;
  label: string;
  dontKnow?: boolean;
  /** Keyed by causeId; a cause not named is neutral. */
  evidence: Record<string, Weight>;
}

export interface DxCause {
  id: string;
  priorWeight: number;
  inspectMinutes?: number;
}

export interface DxTree {
  rootId: string;
  nodes: DxNode[];
  options: DxOption[];
  causes: DxCause[];
}

export interface DxAnswer {
  nodeId: string;
  optionId: string;
}

export interface DxSettings {
  /** Defaults: rules_out 0, against 1/3, neutral 1, for 3, strong 9. */
  weights?: Partial<Record<Strength, number>>;
  /** Confirmed bench counts per causeId for the case's motor family. */
  history?: Record<string, number>;
  /** α, pseudo-cases behind the editor's prior weights; default 10. */
  priorStrength?: number;
  /** Default 0.05; 0 disables the unlisted hypothesis. */
  unlistedShare?: number;
  /** Learned P(o|k), optionId → causeId → probability; overrides the authored likelihood. */
  likelihoods?: Record<string, Record<string, number>>;
  /** Top-cause probability at which to suggest concluding; default 0.8. */
  stopThreshold?: number;
  /** Below this expected gain (bits) a node counts as uninformative; default 0.05. */
  minGainBits?: number;
}

export interface ScoredCause {
  causeId: string;
  probability: number;
  ruledOutBy: DxAnswer | null;
}

export interface CauseScores {
  causes: ScoredCause[];
  unlisted: number;
}

export interface RankedQuestion {
  nodeId: string;
  gainBits: number;
  gainPerMinute: number;
  separates: string[];
}

export interface Conclusion {
  kind: "cause" | "unlisted" | "continue";
  causeId?: string;
  probability: number;
}

/** The ranking after a list of answers: what the triage screen shows and each case step stores. */
export interface Ranking extends CauseScores {
  /** The best next questions, best first. */
  suggestions: RankedQuestion[];
  conclusion: Conclusion;
}

export interface BenchItem {
  id: string;
  probability: number;
  costMinutes: number;
}

export interface BenchPlan {
  order: string[];
  expectedMinutes: number;
}

export interface TreeProblem {
  code: string;
  nodeId?: string;
  optionId?: string;
  message: string;
}

export interface ClosedCase {
  answers: DxAnswer[];
  confirmedCauseId: string;
}

/** What the history says about one question-and-cause column: P(o | q, k) over the node's outcomes. */
export interface EvidenceColumn {
  nodeId: string;
  causeId: string;
  /** The node's outcomes ("don't know" left out), in tree order; the arrays below follow it. */
  optionIds: string[];
  counts: number[];
  /** N(q,·,k): the cases behind the column. */
  cases: number;
  authored: number[];
  learned: number[];
  /** Pseudo-cases of pull toward the authored column; Infinity keeps the authored values. */
  strength: number;
  /** Whether the strength was fixed by the caller, estimated from this column, or from the whole tree (a thin column). */
  strengthFrom: "fixed" | "column" | "tree";
  /** Natural log of the Bayes factor "the answers follow another distribution" against "they follow the authored one". */
  logBayesFactor: number;
}

export interface LearnedLikelihoods {
  likelihoods: NonNullable<DxSettings["likelihoods"]>;
  /** The strength estimated over all columns of the tree (or the fixed one), used for thin columns. */
  treeStrength: number;
  columns: EvidenceColumn[];
  /** The columns whose Bayes factor reaches the review threshold, in column order. */
  suggestions: EvidenceColumn[];
}

export interface Interval {
  low: number;
  high: number;
}

export interface RankingRow {
  probabilities: Record<string, number>;
  confirmed: string;
}

export interface RankingRowScore {
  /** 1-based rank of the confirmed category; Infinity when it was not predicted (absent or p = 0). */
  rank: number;
  confirmedP: number;
  topP: number;
  /** Σ over categories of (p − y)², the confirmed one included at p = 0 when absent. */
  brier: number;
  /** −ln p of the confirmed category, p clipped to [1e-6, 1]. */
  logLoss: number;
}

export interface CalibrationBin {
  from: number;
  to: number;
  n: number;
  meanPredicted: number;
  observed: number;
}

export interface RankingScores {
  n: number;
  top1: number;
  top3: number;
  brier: number;
  logLoss: number;
  calibration: CalibrationBin[];
}

export interface PathWalk {
  visited: string[];
  current: string | null;
  cautions: string[];
  reachedCauseIds: string[];
}
