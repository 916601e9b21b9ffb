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
  Ranking,
  BenchItem,
  BenchPlan,
  TreeProblem,
  ClosedCase,
  EvidenceColumn,
  LearnedLikelihoods,
  Interval,
  RankingRow,
  RankingScores,
  RankingRowScore,
  CalibrationBin,
  PathWalk,
} from "./types";
export { STRENGTHS } from "./types";
export { DiagnosisError, type DiagnosisErrorCode } from "./errors";
export { DEFAULT_WEIGHTS, weightTable, type WeightTable } from "./weights";
export { authoredLikelihoods, normaliseWeights } from "./likelihood";
export { scoreCauses } from "./score";
export { entropyBits, expectedInformationGain } from "./information";
export { rankNextQuestions } from "./next-question";
export { suggestConclusion } from "./conclusion";
export { rankingAfter, RANKING_SUGGESTIONS } from "./ranking";
export { ModelCache } from "./model";
export { benchPlan } from "./bench-plan";
export { validateTree } from "./validate";
export { learnLikelihoods, DEFAULT_LEARNING_STRENGTH, MIN_COLUMN_CASES, REVIEW_BAYES_FACTOR } from "./learn";
export { estimatePrecision, logMarginalLikelihood, logBayesFactorAgainstMean, posteriorMean, type CountColumn } from "./dirichlet";
export { wilsonInterval, rankingScores, rankingRowScore, calibrationBin, CALIBRATION_BINS, topKAccuracy, Z_95 } from "./statistics";
export { walkPath } from "./path";
export { kaplanMeier, logRank, type SurvivalObservation, type KaplanMeierStep } from "./survival";
export { kaplanMeierOfTally, logRankOfTally, tallyObservations, type SurvivalTally } from "./survival";
export {
  teardownPlan,
  teardownPlanInOrder,
  teardownPlanner,
  type Assembly,
  type BenchInspection,
  type TeardownStep,
  type TeardownPlan,
} from "./teardown-plan";
export { companionFigures, type CompanionFigures } from "./companions";
