import "server-only";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db";
import { causes, practiceAttempts } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { AppError } from "@/lib/errors";
import { loadBenchFindings, loadPracticeReplay } from "./queries";
import type { BenchResult } from "./types";

export const commitPracticeInput = z.object({
  caseId: z.coerce.number({ error: "No case given." }).int().positive("No case given."),
  cause: z.string({ error: "Pick the cause you think the bench found." }).trim().min(1, "Pick the cause you think the bench found.").max(80),
  revealedSteps: z.coerce.number().int().min(0).max(1000).default(0),
  startedAt: z.string().max(40).optional(),
});

// The start time comes from the page; keep it only when it is plausible (within the last day).
function plausibleStart(raw: string | undefined, now: Date): Date {
  const at = raw ? new Date(raw) : null;
  return at && !Number.isNaN(at.getTime()) && at <= now && now.getTime() - at.getTime() < 86_400_000 ? at : now;
}

/**
 * The trainee commits to a cause; only then is the bench result sent. Writes one practice_attempts
 * row and nothing else: real cases and the shop's statistics never change.
 */
export const commitPracticeAction = defineAction({
  name: "practice.commit",
  access: "practice:run",
  input: commitPracticeInput,
  async run(input, { user }): Promise<BenchResult> {
    const replay = await loadPracticeReplay(input.caseId);
    const choice = replay.choices.find((c) => c.slug === input.cause);
    if (!choice) throw new AppError("invalid", "Pick one of this tree's causes.", { fieldErrors: { cause: "Pick one of this tree's causes." } });
    const [[cause], findings] = await Promise.all([
      db.select({ id: causes.id }).from(causes).where(eq(causes.slug, choice.slug)).limit(1),
      loadBenchFindings(input.caseId),
    ]);
    const hit = findings.confirmed.some((c) => c.slug === choice.slug);
    const now = new Date();
    await db.insert(practiceAttempts).values({
      traineeId: user.id, caseId: input.caseId, revealedSteps: Math.min(input.revealedSteps, replay.steps.length),
      committedCauseId: cause.id, hit, startedAt: plausibleStart(input.startedAt, now), finishedAt: now,
    });
    const finalRanking = replay.rankings[replay.rankings.length - 1];
    const first = findings.confirmed[0];
    const rank = first ? finalRanking.causes.findIndex((c) => c.slug === first.slug) : -1;
    return {
      hit,
      committed: choice,
      confirmed: findings.confirmed.map((c) => ({ slug: c.slug, name: c.name, primary: c.primary })),
      otherCause: findings.outcome?.otherCause ?? "",
      parts: findings.parts,
      upgrades: findings.outcome?.upgrades ?? "",
      labourMinutes: findings.outcome?.labourMinutes ?? 0,
      notes: findings.outcome?.notes ?? "",
      engineRank: rank >= 0 ? rank + 1 : null,
    };
  },
});
