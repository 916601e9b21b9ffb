import "server-only";
import { defineAction } from "@/lib/actions/define";
import { DiagnosisError, rankingAfter, type DxAnswer } from "@/lib/diagnosis";
import { AppError, pgErrorCode } from "@/lib/errors";
import { loadCaseContext, type CaseContext } from "./context";
import { answerInput, type AnswerInput } from "./inputs";
import type { StoredRanking } from "./ranking-types";
import { appendStep, type InsertedStep } from "./step-writes";
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

/** The engine's ranking after `answers` on this case's tree and settings. */
export function caseRanking(tree: CaseTree, answers: DxAnswer[], ctx: Pick<CaseContext, "settings">): StoredRanking {
  try {
    return rankingAfter(tree.dx, answers, ctx.settings, tree.models);
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

/** Reads the case, checks the answer, ranks, and stores the step; null when a guard refused it. */
async function tryAnswer(input: AnswerInput, userId: string): Promise<AnsweredStep | null> {
  const ctx = await loadCaseContext(input.caseId);
  if (!ctx) throw new AppError("not_found", "That case does not exist.");
  assertOpen(ctx);
  const tree = await publishedTree(ctx.treeVersionId);
  const { node, option } = validate(tree, input);
  const ranking = caseRanking(tree, [...answersOf(tree, ctx.steps), { nodeId: node.key, optionId: option.key }], ctx);
  let step: InsertedStep | null;
  try {
    step = await appendStep({ caseId: ctx.id, previous: ctx.steps.at(-1) ?? null, nodeId: node.id, optionId: option.id, userId, ranking, basis: ctx.basis });
  } catch (error) {
    if (pgErrorCode(error) !== "23505") throw error;
    return null;
  }
  if (!step) return null;
  return { step: { id: step.id, seq: step.seq, nodeKey: node.key, optionKey: option.key, answeredAt: step.answeredAt.toISOString() }, ranking };
}

/**
 * Records one answer and returns the ranking shown after it, which the step stores. The caller
 * has been checked already (defineAction). When another answer, an undo, the finish or a
 * settings change got in between reading the case and storing the step, it starts again from what
 * is stored now, so two answers sent in quick succession both land, in order.
 */
export async function recordAnswer(input: AnswerInput, userId: string): Promise<AnsweredStep> {
  for (let attempt = 1; attempt <= ATTEMPTS; attempt++) {
    const answered = await tryAnswer(input, userId);
    if (answered) return answered;
  }
  throw new AppError("conflict", "The case changed in another window while you answered; reload it and try again.");
}

export const answerStepAction = defineAction({
  name: "cases.answer",
  access: "case:work",
  input: answerInput,
  run: (input, { user }) => recordAnswer(input, user.id),
});
