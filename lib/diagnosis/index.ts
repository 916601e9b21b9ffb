export type {
  Strength,
  Weight,
  DxNode,
  DxOption,
  DxCause,
  DxTree,
  DxAnswer,
  DxSettings,
  ScoredCause,
  CauseScores,
  RankedQuestion,
  Conclusion,
  BenchItem,
  BenchPlan,
  TreeProblem,
  ClosedCase,
  EvidenceSuggestion,
  LearnedLikelihoods,
  Interval,
  RankingRow,
  RankingScores,
  CalibrationBin,
  PathWalk,
} from "./types";
export { STRENGTHS } from "./types";
export { DiagnosisError, type DiagnosisErrorCode } from "./errors";
export { DEFAULT_WEIGHTS } from "./weights";
export { scoreCauses } from "./score";
export { entropyBits, expectedInformationGain } from "./information";
export { rankNextQuestions } from "./next-question";
export { suggestConclusion } from "./conclusion";
export { analyseAnswers, type Analysis } from "./analyse";
export { ModelCache } from "./model";
export { benchPlan } from "./bench-plan";
export { validateTree } from "./validate";
export { learnLikelihoods } from "./learn";
export { wilsonInterval, rankingScores, topKAccuracy, Z_95 } from "./statistics";
export { walkPath } from "./path";
