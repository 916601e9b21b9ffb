import "server-only";
import { defineAction, type OneTripDone } from "@/lib/actions/define";
import type { CallerCheck } from "@/lib/auth/caller-check";
import { DiagnosisError, type DxAnswer } from "@/lib/diagnosis";
import { AppError, isAppError, pgErrorCode } from "@/lib/errors";
import { loadCaseContext, type CaseContext } from "./context";
import { answerInput, type AnswerInput } from "./inputs";
import { computeRanking } from "./ranking";
import type { StoredRanking } from "./ranking-types";
import { anticipate, anticipatedRanking } from "./anticipated-rankings";
import { rememberAppended } from "./context-cache";
import { appendStep, type InsertedStep, type StepAuthor } from "./step-writes";
import { publishedTree, type CaseTree } from "./tree-cache";

export interface AnsweredStep {
  step: { id: number; seq: number; nodeKey: string; optionKey: string; answeredAt: string };
  ranking: StoredRanking;
}

export function assertOpen(ctx: Pick<CaseContext, "reference" | "status">): void {
  if (ctx.status !== "open") {
    throw new AppError("conflict", `Case ${ctx.reference} is ${ctx.status.replace("_", " ")}; its triage is finished, so nothing can be answered or undone.`);
  }
}

export function answersOf(tree: CaseTree, steps: CaseContext["steps"]): DxAnswer[] {
  return steps.map((s) => ({ nodeId: tree.nodeById.get(s.nodeId)?.key ?? "", optionId: tree.optionById.get(s.optionId)?.key ?? "" }));
}

/** The ranking after `answers`: worked out ahead if it was (anticipated-rankings.ts), else now. */
export function rankingFor(tree: CaseTree, answers: DxAnswer[], ctx: Pick<CaseContext, "settings">): StoredRanking {
  const ready = anticipatedRanking(tree, answers, ctx.settings);
  if (ready) return ready;
  try {
    return computeRanking(tree.dx, answers, ctx.settings, tree.models);
  } catch (error) {
    if (error instanceof DiagnosisError) throw new AppError("invalid", `The tree cannot score these answers: ${error.message}`);
    throw error;
  }
}

function validate(tree: CaseTree, input: AnswerInput) {
  const node = tree.nodeById.get(input.nodeId);
  if (!node) throw new AppError("invalid", "That question is not part of the tree this case is walked on.");
  if (node.kind !== "question" && node.kind !== "check") {
    throw new AppError("invalid", `“${node.title}” is a ${node.kind} node; only questions and checks take an answer.`);
  }
  const option = tree.optionById.get(input.optionId);
  if (!option) throw new AppError("invalid", "That answer is not an option anywhere in this case's tree.");
  if (option.fromKey !== node.key) {
    const owner = tree.nodeByKey.get(option.fromKey);
    throw new AppError("invalid", `The answer “${option.label}” belongs to “${owner?.title ?? option.fromKey}”, not to “${node.title}”.`);
  }
  return { node, option };
}

const ATTEMPTS = 3;

interface PreparedAnswer {
  ctx: CaseContext;
  tree: CaseTree;
  /** The case's answers including this one. */
  answers: DxAnswer[];
  node: TreeNodeRef;
  option: TreeOptionRef;
  ranking: StoredRanking;
}
type TreeNodeRef = ReturnType<typeof validate>["node"];
type TreeOptionRef = ReturnType<typeof validate>["option"];

/** Everything but the write: the case (remembered, with `reuse`), the checked answer, the ranking after it. */
async function prepareAnswer(input: AnswerInput, reuse: boolean): Promise<PreparedAnswer> {
  const ctx = await loadCaseContext(input.caseId, { reuse });
  if (!ctx) throw new AppError("not_found", "That case does not exist.");
  assertOpen(ctx);
  const tree = await publishedTree(ctx.treeVersionId);
  const { node, option } = validate(tree, input);
  const answers = [...answersOf(tree, ctx.steps), { nodeId: node.key, optionId: option.key }];
  return { ctx, tree, answers, node, option, ranking: rankingFor(tree, answers, ctx) };
}

/** Stores the prepared step; null when a guard refused it (the case changed, or the caller check failed). */
async function storePrepared({ ctx, tree, answers, node, option, ranking }: PreparedAnswer, by: StepAuthor): Promise<{ answered: AnsweredStep; step: InsertedStep } | null> {
  const last = ctx.steps.at(-1) ?? null;
  let step: InsertedStep | null;
  try {
    step = await appendStep({ caseId: ctx.id, previous: last, nodeId: node.id, optionId: option.id, by, ranking, basis: ctx.basis });
  } catch (error) {
    if (pgErrorCode(error) !== "23505") throw error;
    return null;
  }
  if (!step) return null;
  rememberAppended(ctx.id, last?.id ?? null, { id: step.id, seq: step.seq, nodeId: node.id, optionId: option.id });
  void anticipate(tree, answers, ctx.settings, ranking);
  const answered = { step: { id: step.id, seq: step.seq, nodeKey: node.key, optionKey: option.key, answeredAt: step.answeredAt.toISOString() }, ranking };
  return { answered, step };
}

/** Records one answer and returns the ranking shown after it (DESIGN §4, stored on the step). */
export async function recordAnswer(input: AnswerInput, userId: string): Promise<AnsweredStep> {
  for (let attempt = 1; ; attempt++) {
    // The first try works from what this process already knows of the case; a refused insert reads afresh.
    const stored = await storePrepared(await prepareAnswer(input, attempt === 1), { userId });
    if (stored) return stored.answered;
    // Another answer, an undo, the finish or a settings change got in between: start again from what is stored now.
    if (attempt === ATTEMPTS) throw new AppError("conflict", "The case changed in another window while you answered; reload it and try again.");
  }
}

/**
 * The answer in one round trip for a case this process remembers: the step insert itself checks
 * the caller's session and role (callerRow), so no session query goes first. The ranking is
 * computed before the caller is known to be allowed, and is returned and stored only if they are.
 * Null on anything out of the ordinary; the ordinary path then answers (see `inOneTrip`).
 */
export async function recordAnswerInOneTrip(input: AnswerInput, caller: CallerCheck): Promise<OneTripDone<AnsweredStep> | null> {
  let prepared: PreparedAnswer;
  try {
    prepared = await prepareAnswer(input, true);
  } catch (error) {
    if (isAppError(error)) return null;
    throw error;
  }
  const stored = await storePrepared(prepared, { caller });
  if (!stored?.step.sessionExpiresAt) return null;
  return { value: stored.answered, sessionExpiresAt: stored.step.sessionExpiresAt };
}

/** Scores ahead for the case as it stands now (after an undo); see anticipated-rankings.ts. */
export async function anticipateForCase(caseId: number, ranking: Pick<StoredRanking, "suggestions">): Promise<number> {
  const ctx = await loadCaseContext(caseId, { reuse: true });
  if (!ctx || ctx.status !== "open") return 0;
  const tree = await publishedTree(ctx.treeVersionId);
  return anticipate(tree, answersOf(tree, ctx.steps), ctx.settings, ranking);
}

export const answerStepAction = defineAction({
  name: "cases.answer",
  access: "case:work",
  input: answerInput,
  run: (input, { user }) => recordAnswer(input, user.id),
  inOneTrip: recordAnswerInOneTrip,
});
