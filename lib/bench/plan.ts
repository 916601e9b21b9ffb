import "server-only";
import type { CaseStatus } from "@/db/schema";
import { benchProgress } from "./progress";
import { loadBench } from "./queries";

/** The bench plan as the case page and the job card print it. */
export interface TeardownSummary {
  /** Cause slugs in the order the bench screen's checklist inspects them. */
  order: string[];
  expectedMinutes: number;
  /** The bench screen that works through it. */
  href: string;
}

/** A unit in the shop is planned through its family's stages, whatever the call ended with. */
const IN_SHOP: ReadonlySet<CaseStatus> = new Set(["booked_in", "on_bench"]);

/**
 * The bench screen's own plan (its checklist and expected minutes, after the findings so far) for
 * a unit in the shop; null for a case that has no unit in the shop, whose bench plan is the one
 * the call ended with.
 */
export async function teardownSummary(kase: { id: number; status: CaseStatus }): Promise<TeardownSummary | null> {
  if (!IN_SHOP.has(kase.status)) return null;
  const bench = await loadBench(kase.id);
  if (!bench) return null;
  const progress = benchProgress(bench.inputs);
  return { order: progress.checklist.map((step) => step.cause), expectedMinutes: progress.expectedMinutesLeft, href: `/cases/${kase.id}/bench` };
}
