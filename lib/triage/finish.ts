import "server-only";
import { desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { caseEvents, cases, caseSteps, motorFamilies } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { walkPath } from "@/lib/diagnosis";
import { AppError } from "@/lib/errors";
import { enqueueMail } from "@/lib/mail/outbox";
import { answersOf, assertOpen, rankingFor } from "./answer";
import { causesBySlug } from "./catalogue";
import { loadCaseContext } from "./context";
import { forgetCase } from "./context-cache";
import { finishInput, type FinishInput } from "./inputs";
import { benchPlanFor, roughQuote } from "./quote";
import { finalRankingOf, type StoredRanking } from "./ranking-types";
import { rideAdvice } from "./safety";
import { sendInstructions } from "./shipping";
import { loadShop } from "@/lib/cases/shop";
import { composeSummaryMail } from "./summary-mail";
import { publishedTree } from "./tree-cache";
import { reachedCautions } from "./walk-view";

export interface FinishedCase {
  id: number;
  status: "advised" | "booked_in";
  mailQueued: boolean;
}

const LIKELY_IN_MAIL = 3;
const LIKELY_MIN = 0.05;

/**
 * Ends the triage: stores the final ranking (the one shown after the last answer), quote,
 * bench plan and what to send, moves the case to advised or booked in, and queues the summary
 * e-mail to the caller in the same transaction, so the message exists exactly when the change does.
 */
export async function finishCase(input: FinishInput, userId: string): Promise<FinishedCase> {
  const ctx = await loadCaseContext(input.caseId);
  if (!ctx) throw new AppError("not_found", "That case does not exist.");
  assertOpen(ctx);
  const tree = await publishedTree(ctx.treeVersionId);
  const answers = answersOf(tree, ctx.steps);
  const shop = await loadShop();

  const finished = await db.transaction(async (tx) => {
    const [row] = await tx.select().from(cases).where(eq(cases.id, ctx.id)).for("update");
    assertOpen(row);
    const [last] = await tx.select({ id: caseSteps.id, ranking: caseSteps.ranking }).from(caseSteps)
      .where(eq(caseSteps.caseId, ctx.id)).orderBy(desc(caseSteps.seq)).limit(1);
    if ((last?.id ?? null) !== (ctx.steps.at(-1)?.id ?? null)) {
      throw new AppError("conflict", "An answer changed while you were finishing; check the ranking and finish again.");
    }
    const ranking: StoredRanking = last ? (last.ranking as StoredRanking) : rankingFor(tree, answers, ctx);
    const catalogue = await causesBySlug(ranking.causes.map((c) => c.causeId), tx);
    const [family] = await tx.select({ name: motorFamilies.name, generation: motorFamilies.generation }).from(motorFamilies)
      .where(eq(motorFamilies.id, row.familyId)).limit(1);

    const walk = walkPath(tree.dx, answers);
    const advice = rideAdvice(ranking, (slug) => catalogue.get(slug)?.area, reachedCautions(walk.cautions, tree.nodeByKey, tree.graph.options));
    const booked = input.outcome === "booked_in";
    const quote = booked ? roughQuote(ranking, catalogue) : null;
    const plan = booked ? benchPlanFor(ranking, catalogue) : null;
    const toSend = input.outcome === "booked_in" ? sendInstructions(input.send) : "";
    const now = new Date();

    await tx.update(cases).set({
      status: input.outcome,
      finalRanking: finalRankingOf(ranking),
      quoteLowCents: quote?.lowCents ?? null,
      quoteHighCents: quote?.highCents ?? null,
      benchPlan: plan,
      whatToSend: toSend,
      triagedAt: now,
      updatedAt: now,
    }).where(eq(cases.id, row.id));
    await tx.insert(caseEvents).values({
      caseId: row.id, kind: input.outcome, fromStatus: "open", toStatus: input.outcome, byUserId: userId, note: input.advice,
    });

    let mailQueued = false;
    if (row.email) {
      const mail = composeSummaryMail({
        shop, reference: row.reference, callerName: row.callerName,
        familyName: family ? `${family.name} ${family.generation}`.trim() : "drive unit",
        symptom: row.symptom, outcome: input.outcome,
        likely: ranking.causes.filter((c) => c.probability >= LIKELY_MIN).slice(0, LIKELY_IN_MAIL)
          .map((c) => ({ name: catalogue.get(c.causeId)?.name ?? c.causeId, probability: c.probability })),
        unlisted: ranking.unlisted, quote, sendInstructions: toSend, advice: input.advice, stopRiding: advice.stopRiding,
      });
      await enqueueMail(tx, { to: row.email, subject: mail.subject, text: mail.text, html: mail.html, caseId: row.id });
      await tx.insert(caseEvents).values({ caseId: row.id, kind: "mail_queued", byUserId: userId, note: `Summary to ${row.email}` });
      mailQueued = true;
    }
    return { id: row.id, status: input.outcome, mailQueued };
  });
  forgetCase(ctx.id);
  return finished;
}

export const finishCaseAction = defineAction({
  name: "cases.finish",
  access: "case:work",
  input: finishInput,
  run: (input, { user }) => finishCase(input, user.id),
});
