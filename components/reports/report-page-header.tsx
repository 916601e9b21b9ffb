import type { Role } from "@/lib/auth/roles";
import { may } from "@/lib/auth/roles";
import { formatDay } from "@/lib/format";
import { filterQuery } from "@/lib/reports/period";
import type { ReportScope } from "@/lib/reports/scope";
import { ReportFilterBar } from "./report-filter";
import { reportPath, ReportsNav, type ReportPageKey } from "./reports-nav";

/** The top of the causes, trees and parts pages: the reports' row of pages, the title, what is counted, the filter. */
export function ReportPageHeader({ current, title, scope, families, role }: {
  current: ReportPageKey;
  title: string;
  scope: ReportScope;
  families: { slug: string; name: string }[];
  role: Role;
}) {
  const { filter } = scope;
  const query = filterQuery(filter);
  return (
    <>
      <ReportsNav current={current} query={query} role={role} />
      <div>
        <h1>{title}</h1>
        <p className="text-ink-soft" data-testid="report-scope">
          Closed cases from {formatDay(filter.period.from)} to {formatDay(new Date(filter.period.to.getTime() - 1))}, {scope.familyName ?? "all motor families"}.
        </p>
      </div>
      <ReportFilterBar path={reportPath(current)} filter={filter} families={families}
        exportHref={may(role, "reports:export") ? `/api/exports/cases?${query}` : null} />
    </>
  );
}
