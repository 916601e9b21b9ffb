import type { Metadata } from "next";
import { ReportsNav } from "@/components/reports/reports-nav";
import { ComparisonCard } from "@/components/survival/comparison-card";
import { SurvivalFilterBar } from "@/components/survival/survival-filter";
import { WarrantyForm } from "@/components/survival/warranty-form";
import { WarrantyTable } from "@/components/survival/warranty-table";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { may } from "@/lib/auth/roles";
import { formatDay } from "@/lib/format";
import { familyOptions } from "@/lib/reports/scope";
import { parseSurvivalFilter } from "@/lib/survival/filter";
import { loadSurvivalReport } from "@/lib/survival/report";
import { saveWarranty } from "./actions";

export const metadata: Metadata = { title: "Does it last?" };

export default async function LastingPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireRole("reports:read", "/reports/lasting");
  const filter = parseSurvivalFilter(await searchParams);
  const [report, families] = await Promise.all([loadSurvivalReport(filter), familyOptions()]);
  const months = Math.max(12, report.filter.months);

  return (
    <div className="flex flex-col gap-6" data-testid="lasting-page">
      <ReportsNav current="lasting" query="" role={user.role} />
      <div>
        <h1>Does the repair last?</h1>
        <p className="text-ink-soft" data-testid="lasting-scope">
          Repairs closed from {formatDay(report.from)} to today, {report.familyName ?? "all motor families"}, {report.filter.ridingUse ? `${report.filter.ridingUse} riding` : "all riding uses"}.
        </p>
      </div>
      <SurvivalFilterBar filter={report.filter} families={families} />
      <Panel title="How this is counted">
        <p className="text-sm text-ink-soft">
          Each closed repair with a serial is followed from the day it was closed. It ends when the same unit (same motor family and serial)
          next comes in: if the bench confirms a fault of the same kind as the one repaired (clutch; seal and bearing; gearing, belt and housing;
          electrics and sensor), that is a return; a visit for an unrelated fault, or one not yet diagnosed, ends the follow-up without counting
          against the repair. Units not back are counted up to today. Curves are Kaplan–Meier estimates with 95 % bands; the p-value is the
          log-rank test. A difference here is what this shop has seen, not proof of cause: units that get an upgrade may also be ridden differently.
        </p>
      </Panel>
      <Panel title={`Back within the ${report.warrantyMonths}-month warranty`}>
        <WarrantyTable rows={report.warranty} months={report.warrantyMonths} />
        {may(user.role, "settings:edit") ? <div className="mt-4"><WarrantyForm months={report.warrantyMonths} action={saveWarranty} /></div> : null}
      </Panel>
      <div className="grid gap-6 xl:grid-cols-2">
        {report.comparisons.map((c) => <ComparisonCard key={c.upgrade.slug} comparison={c} months={months} />)}
      </div>
    </div>
  );
}
