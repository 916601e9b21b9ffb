import type { Metadata } from "next";
import { PartsSection } from "@/components/reports/parts-section";
import { PlanVsActualSection } from "@/components/reports/plan-vs-actual-section";
import { ReportPageHeader } from "@/components/reports/report-page-header";
import { requireRole } from "@/lib/auth/require-role";
import { loadPartsReport } from "@/lib/reports";
import { parseReportFilter } from "@/lib/reports/period";
import { familyOptions } from "@/lib/reports/scope";

export const metadata: Metadata = { title: "Reports: parts and labour" };

export default async function PartsReportPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireRole("reports:read", "/reports/parts");
  const [report, families] = await Promise.all([loadPartsReport(parseReportFilter(await searchParams)), familyOptions()]);
  return (
    <div className="flex flex-col gap-6" data-testid="reports-page" data-report="parts">
      <ReportPageHeader current="parts" title="Parts and labour" scope={report.scope} families={families} role={user.role} />
      <PartsSection demand={report.parts} period={report.scope.filter.period} />
      <PlanVsActualSection rows={report.benchPlans} />
    </div>
  );
}
