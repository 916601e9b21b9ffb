import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { caseOutcomes, cases, causes, outcomeCauses, outcomeParts, outcomeUpgrades, parts, uploads } from "@/db/schema";
import { defineAction } from "@/lib/actions/define";
import { AppError } from "@/lib/errors";
import { storePlannedTeardown } from "@/lib/bench/planned-teardown";
import { storeTriageScores } from "@/lib/reports/triage-scores";
import { relearn } from "@/lib/review/learned";
import { storeOutcomeCopies } from "./outcome-copies";
import { caseOnlyInput, outcomeFormInput, OTHER_PRIMARY, reopenInput } from "./input";
import { refreshRepeatLink } from "./repeat";
import { lockCase, moveStatus, outcomeLockedReason } from "./status";

export interface OutcomeSaved {
  caseId: number;
  closed: boolean;
  repeatOfCaseId: number | null;
}

/**
 * Saves the bench outcome of a case on the bench (confirmed causes with one primary, parts,
 * upgrades, labour, notes) and, with intent "close", closes the case in the same transaction,
 * where its tree version's learned likelihoods are learned again with it.
 */
export const saveOutcomeAction = defineAction({
  name: "outcomes.save",
  access: "case:work",
  input: outcomeFormInput,
  async run(input, { user }): Promise<{ ok: true; data: OutcomeSaved; message: string }> {
    return db.transaction(async (tx) => {
      const c = await lockCase(tx, input.caseId);
      const locked = outcomeLockedReason(c.status);
      if (locked) throw new AppError("conflict", locked);

      if (input.causeIds.length) {
        const found = await tx.select({ id: causes.id }).from(causes).where(inArray(causes.id, input.causeIds));
        if (found.length !== input.causeIds.length) throw new AppError("invalid", "A confirmed cause is not in the catalogue any more; reload the page.", { fieldErrors: { causeId: "Unknown cause." } });
      }
      const partIds = input.parts.map((p) => p.partId);
      if (partIds.length) {
        const found = await tx.select({ id: parts.id }).from(parts).where(inArray(parts.id, partIds));
        if (found.length !== partIds.length) throw new AppError("invalid", "A replaced part is not in the catalogue any more; reload the page.", { fieldErrors: { partId: "Unknown part." } });
      }

      const now = new Date();
      const values = {
        otherCause: input.otherCause, upgrades: input.upgrades, labourMinutes: input.labourMinutes, notes: input.notes,
        recordedBy: user.id || null, recordedAt: now,
      };
      await tx.insert(caseOutcomes).values({ caseId: c.id, ...values }).onConflictDoUpdate({ target: caseOutcomes.caseId, set: values });
      await tx.delete(outcomeCauses).where(eq(outcomeCauses.caseId, c.id));
      if (input.causeIds.length) {
        await tx.insert(outcomeCauses).values(input.causeIds.map((causeId) => ({
          caseId: c.id, causeId, primary: input.primary !== OTHER_PRIMARY && input.primary === causeId,
        })));
      }
      await tx.delete(outcomeUpgrades).where(eq(outcomeUpgrades.caseId, c.id));
      if (input.upgradeKinds.length) await tx.insert(outcomeUpgrades).values(input.upgradeKinds.map((upgrade) => ({ caseId: c.id, upgrade })));
      await tx.delete(outcomeParts).where(eq(outcomeParts.caseId, c.id));
      if (input.parts.length) await tx.insert(outcomeParts).values(input.parts.map((p) => ({ caseId: c.id, ...p })));
      await storeOutcomeCopies(tx, [c.id]);
      await storeTriageScores(tx, [c.id]);
      await storePlannedTeardown(tx, [c.id]);
      if (input.detachPhotoIds.length) {
        await tx.update(uploads).set({ caseId: null }).where(and(eq(uploads.caseId, c.id), inArray(uploads.id, input.detachPhotoIds)));
      }
      await tx.update(cases).set({ updatedAt: now }).where(eq(cases.id, c.id));
      const repeatOfCaseId = await refreshRepeatLink(tx, c.id);

      const closing = input.intent === "close";
      if (closing) {
        await moveStatus(tx, c, "closed", user.id);
        await relearn(tx, c.treeVersionId);
      }
      return {
        ok: true as const,
        data: { caseId: c.id, closed: closing, repeatOfCaseId },
        message: closing ? `Outcome saved and ${c.reference} closed.` : "Outcome saved.",
      };
    });
  },
});

/** booked_in → on_bench: the unit is on the bench and its outcome can be recorded. */
export const startBenchAction = defineAction({
  name: "outcomes.startBench",
  access: "case:work",
  input: caseOnlyInput,
  async run(input, { user }) {
    return db.transaction(async (tx) => {
      const c = await lockCase(tx, input.caseId);
      if (c.status !== "booked_in") throw new AppError("conflict", `Only a booked-in case can go on the bench; this one is ${c.status.replace("_", " ")}.`);
      await moveStatus(tx, c, "on_bench", user.id);
      await refreshRepeatLink(tx, c.id);
      return { ok: true as const, data: { caseId: c.id }, message: `${c.reference} is on the bench.` };
    });
  },
});

/**
 * closed → on_bench with a reason, recorded as a "reopened" case event; the outcome can be edited
 * again, and its tree version's learned likelihoods are learned again without it.
 */
export const reopenCaseAction = defineAction({
  name: "outcomes.reopen",
  access: "case:reopen",
  input: reopenInput,
  async run(input, { user }) {
    return db.transaction(async (tx) => {
      const c = await lockCase(tx, input.caseId);
      if (c.status !== "closed") throw new AppError("conflict", "Only a closed case can be reopened.");
      await moveStatus(tx, c, "on_bench", user.id, { kind: "reopened", note: input.reason });
      await relearn(tx, c.treeVersionId);
      return { ok: true as const, data: { caseId: c.id }, message: `${c.reference} is open on the bench again.` };
    });
  },
});

