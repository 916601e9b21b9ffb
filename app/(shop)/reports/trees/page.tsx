import type { Metadata } from "next";
import { AccuracySection } from "@/components/reports/accuracy-section";
import { ReportPageHeader } from "@/components/reports/report-page-header";
import { requireRole } from "@/lib/auth/require-role";
import { loadTreeReport } from "@/lib/reports";
import { filterQuery, parseReportFilter } from "@/lib/reports/period";
import { familyOptions } from "@/lib/reports/scope";

export const metadata: Metadata = { title: "Reports: tree accuracy" };

export default async function TreeReportPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireRole("reports:read", "/reports/trees");
  const params = await searchParams;
  const [report, families] = await Promise.all([loadTreeReport(parseReportFilter(params)), familyOptions()]);
  const query = filterQuery(report.scope.filter);
  const version = Number(Array.isArray(params.version) ? params.version[0] : params.version);
  return (
    <div className="flex flex-col gap-6" data-testid="reports-page" data-report="trees">
      <ReportPageHeader current="trees" title="Tree accuracy and calibration" scope={report.scope} families={families} role={user.role} />
      <AccuracySection
        accuracy={report.accuracy}
        selectedVersionId={Number.isSafeInteger(version) ? version : null}
        linkFor={(id) => `/reports/trees?${query}&version=${id}#calibration`}
      />
    </div>
  );
}
