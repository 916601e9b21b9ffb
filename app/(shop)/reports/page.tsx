import type { Metadata } from "next";
import Link from "next/link";
import { Suspense } from "react";
import { AccuracySection } from "@/components/reports/accuracy-section";
import { ParetoSection } from "@/components/reports/pareto-section";
import { PlanVsActualSection } from "@/components/reports/plan-vs-actual-section";
import { PartsSection } from "@/components/reports/parts-section";
import { RepeatSection } from "@/components/reports/repeat-section";
import { ReportFilterBar } from "@/components/reports/report-filter";
import { TrendSection } from "@/components/reports/trend-section";
import { requireRole } from "@/lib/auth/require-role";
import { may } from "@/lib/auth/roles";
import { loadShopReport } from "@/lib/reports";
import type { ReportScope } from "@/lib/reports/scope";
import { filterQuery, parseReportFilter } from "@/lib/reports/period";
import { familyOptions, resolveScope } from "@/lib/reports/scope";
import { formatDay } from "@/lib/format";

export const metadata: Metadata = { title: "Reports" };


export default async function ReportsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireRole("reports:read", "/reports");
  const params = await searchParams;
  const [scope, families] = await Promise.all([resolveScope(parseReportFilter(params)), familyOptions()]);
  const { filter } = scope;
  const query = filterQuery(filter);
  const version = Number(Array.isArray(params.version) ? params.version[0] : params.version);
  const { from, to } = filter.period;

  return (
    <div className="flex flex-col gap-6" data-testid="reports-page">
      <div>
        <h1>Shop reports</h1>
        <p className="text-ink-soft" data-testid="report-scope">
          Closed cases from {formatDay(from)} to {formatDay(new Date(to.getTime() - 1))}, {scope.familyName ?? "all motor families"}.
        </p>
        <p className="text-sm"><Link href="/reports/lasting">Does the repair last? Return-free time after repairs, by upgrade</Link></p>
      </div>
      <ReportFilterBar
        filter={filter}
        families={families}
        exportHref={may(user.role, "reports:export") ? `/api/exports/cases?${query}` : null}
        importHref={may(user.role, "reports:import") ? "/reports/import" : null}
      />
      <Suspense fallback={<p className="text-ink-soft" role="status">Counting the closed cases…</p>}>
        <ReportSections scope={scope} selectedVersionId={Number.isSafeInteger(version) ? version : null} query={query} />
      </Suspense>
    </div>
  );
}

/** The report's sections, streamed in once their queries are done (the heading and filter show first). */
async function ReportSections({ scope, selectedVersionId, query }: { scope: ReportScope; selectedVersionId: number | null; query: string }) {
  const report = await loadShopReport(scope);
  const { period } = scope.filter;
  return (
    <>
      <ParetoSection pareto={report.pareto} />
      <TrendSection trend={report.trend} period={period} />
      <AccuracySection
        accuracy={report.accuracy}
        selectedVersionId={selectedVersionId}
        linkFor={(id) => `/reports?${query}&version=${id}#calibration`}
      />
      <div className="grid gap-6">
        <PartsSection demand={report.parts} period={period} />
        <RepeatSection repeats={report.repeats} />
        <PlanVsActualSection rows={report.benchPlans} />
      </div>
    </>
  );
}
