import "server-only";
import { planVsActual, type PlanVsActualRow } from "@/lib/bench/plan-vs-actual";
import { treeAccuracy, type VersionAccuracy } from "./accuracy";
import { causePareto, type Pareto } from "./pareto";
import { partsDemand, type PartsDemand } from "./parts";
import type { ReportFilter } from "./period";
import { repeatRate, type RepeatRate } from "./repeats";
import { resolveScope, type ReportScope } from "./scope";
import { causeTrend, type CauseTrend } from "./trend";

export interface ShopReport {
  scope: ReportScope;
  pareto: Pareto;
  trend: CauseTrend;
  parts: PartsDemand;
  repeats: RepeatRate;
  accuracy: VersionAccuracy[];
  benchPlans: PlanVsActualRow[];
}

/** Everything /reports shows for one period and family, each part its own query, all at once. */
export async function loadShopReport(filter: ReportFilter): Promise<ShopReport> {
  const scope = await resolveScope(filter);
  const [pareto, trend, parts, repeats, accuracy, benchPlans] = await Promise.all([
    causePareto(scope), causeTrend(scope), partsDemand(scope), repeatRate(scope), treeAccuracy(scope), planVsActual(scope),
  ]);
  return { scope, pareto, trend, parts, repeats, accuracy, benchPlans };
}
