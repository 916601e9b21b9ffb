import "server-only";
import { eq, sql } from "drizzle-orm";
import type { Tx } from "@/db";
import { caseEvents, cases, type CaseStatus } from "@/db/schema";
import { AppError } from "@/lib/errors";

export type LockedCase = {
  id: number;
  status: CaseStatus;
  reference: string;
  treeVersionId: number;
};

/** The case row, locked for the rest of the transaction so a save and a close cannot interleave. */
export async function lockCase(tx: Tx, caseId: number): Promise<LockedCase> {
  const rows = await tx.execute<LockedCase>(sql`select id, status, reference, tree_version_id as "treeVersionId" from cases where id = ${caseId} for update`);
  if (!rows[0]) throw new AppError("not_found", "That case does not exist.");
  return rows[0];
}

export const FROZEN_MESSAGE = "This case is closed, so its bench outcome is frozen. A senior mechanic can reopen it to make changes.";

/** Why the bench outcome of a case in this status cannot be edited, or null when it can. */
export function outcomeLockedReason(status: CaseStatus): string | null {
  if (status === "on_bench") return null;
  if (status === "closed") return FROZEN_MESSAGE;
  if (status === "booked_in") return "Put the unit on the bench before recording its outcome.";
  if (status === "advised") return "Advised by phone; no unit came in, so there is no bench outcome.";
  return "Still in triage: the bench outcome is recorded once the unit is on the bench.";
}

/** Moves the case and records the move (who, when, from → to) in case_events. */
export async function moveStatus(
  tx: Tx,
  c: LockedCase,
  to: CaseStatus,
  by: string,
  event: { kind?: string; note?: string } = {},
): Promise<void> {
  const now = new Date();
  await tx
    .update(cases)
    .set({ status: to, updatedAt: now, closedAt: to === "closed" ? now : null })
    .where(eq(cases.id, c.id));
  await tx.insert(caseEvents).values({
    caseId: c.id, kind: event.kind ?? "status", fromStatus: c.status, toStatus: to, byUserId: by || null, note: event.note ?? "", at: now,
  });
}
