import "server-only";
import { planVsActual, type PlanVsActualRow } from "@/lib/bench/plan-vs-actual";
import { treeAccuracy, type VersionAccuracy } from "./accuracy";
import { causePareto, type Pareto } from "./pareto";
import { partsDemand, type PartsDemand } from "./parts";
import type { ReportFilter } from "./period";
import { repeatRate, type RepeatRate } from "./repeats";
import { resolveScope, type ReportScope } from "./scope";
import { causeTrend, type CauseTrend } from "./trend";

/** The causes page: what the bench confirmed, month by month, and how often units came back. */
export interface CauseReport { scope: ReportScope; pareto: Pareto; trend: CauseTrend; repeats: RepeatRate }
/** The trees page: how well each published tree version ranked what the bench confirmed. */
export interface TreeReport { scope: ReportScope; accuracy: VersionAccuracy[] }
/** The parts page: parts fitted, and planned teardown against recorded labour. */
export interface PartsReport { scope: ReportScope; parts: PartsDemand; benchPlans: PlanVsActualRow[] }

// Each reports page loads only its own parts, each part its own query, all at once.

export async function loadCauseReport(filter: ReportFilter): Promise<CauseReport> {
  const scope = await resolveScope(filter);
  const [pareto, trend, repeats] = await Promise.all([causePareto(scope), causeTrend(scope), repeatRate(scope)]);
  return { scope, pareto, trend, repeats };
}

export async function loadTreeReport(filter: ReportFilter): Promise<TreeReport> {
  const scope = await resolveScope(filter);
  return { scope, accuracy: await treeAccuracy(scope) };
}

export async function loadPartsReport(filter: ReportFilter): Promise<PartsReport> {
  const scope = await resolveScope(filter);
  const [parts, benchPlans] = await Promise.all([partsDemand(scope), planVsActual(scope)]);
  return { scope, parts, benchPlans };
}
