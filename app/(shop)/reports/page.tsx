import type { Metadata } from "next";
import Link from "next/link";
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
import { filterQuery, parseReportFilter } from "@/lib/reports/period";
import { familyOptions } from "@/lib/reports/scope";
import { formatDay } from "@/lib/format";

export const metadata: Metadata = { title: "Reports" };


export default async function ReportsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireRole("reports:read", "/reports");
  const params = await searchParams;
  const [report, families] = await Promise.all([loadShopReport(parseReportFilter(params)), familyOptions()]);
  const { filter } = report.scope;
  const query = filterQuery(filter);
  const version = Number(Array.isArray(params.version) ? params.version[0] : params.version);
  const { from, to } = filter.period;

  return (
    <div className="flex flex-col gap-6" data-testid="reports-page">
      <div>
        <h1>Shop reports</h1>
        <p className="text-ink-soft" data-testid="report-scope">
          Closed cases from {formatDay(from)} to {formatDay(new Date(to.getTime() - 1))}, {report.scope.familyName ?? "all motor families"}.
        </p>
        <p className="text-sm"><Link href="/reports/lasting">Does the repair last? Return-free time after repairs, by upgrade</Link></p>
      </div>
      <ReportFilterBar
        filter={filter}
        families={families}
        exportHref={may(user.role, "reports:export") ? `/api/exports/cases?${query}` : null}
        importHref={may(user.role, "reports:import") ? "/reports/import" : null}
      />
      <ParetoSection pareto={report.pareto} />
      <TrendSection trend={report.trend} period={filter.period} />
      <AccuracySection
        accuracy={report.accuracy}
        selectedVersionId={Number.isSafeInteger(version) ? version : null}
        linkFor={(id) => `/reports?${query}&version=${id}#calibration`}
      />
      <div className="grid gap-6">
        <PartsSection demand={report.parts} period={filter.period} />
        <RepeatSection repeats={report.repeats} />
        <PlanVsActualSection rows={report.benchPlans} />
      </div>
    </div>
  );
}
