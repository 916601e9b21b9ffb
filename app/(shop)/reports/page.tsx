import type { Metadata } from "next";
import { ParetoSection } from "@/components/reports/pareto-section";
import { RepeatSection } from "@/components/reports/repeat-section";
import { ReportPageHeader } from "@/components/reports/report-page-header";
import { TrendSection } from "@/components/reports/trend-section";
import { requireRole } from "@/lib/auth/require-role";
import { loadCauseReport } from "@/lib/reports";
import { parseReportFilter } from "@/lib/reports/period";
import { familyOptions } from "@/lib/reports/scope";

export const metadata: Metadata = { title: "Reports: causes" };

export default async function CausesReportPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireRole("reports:read", "/reports");
  const [report, families] = await Promise.all([loadCauseReport(parseReportFilter(await searchParams)), familyOptions()]);
  return (
    <div className="flex flex-col gap-6" data-testid="reports-page" data-report="causes">
      <ReportPageHeader current="causes" title="What the bench confirmed" scope={report.scope} families={families} role={user.role} />
      <ParetoSection pareto={report.pareto} />
      <TrendSection trend={report.trend} period={report.scope.filter.period} />
      <RepeatSection repeats={report.repeats} />
    </div>
  );
}
