import type { Metadata } from "next";
import { ReportsNav } from "@/components/reports/reports-nav";
import { ImportColumns } from "@/components/reports/import-columns";
import { ImportPanel } from "@/components/reports/import-panel";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";

export const metadata: Metadata = { title: "Import past repairs" };

export default async function ImportPage() {
  const user = await requireRole("reports:import", "/reports/import");
  return (
    <div className="flex flex-col gap-6">
      <ReportsNav current="import" query="" role={user.role} />
      <div>
        <h1>Import past repairs</h1>
        <p className="text-ink-soft">Bring the repair history from a spreadsheet into Rootbench. The file is checked first; nothing is written until you confirm.</p>
      </div>
      <Panel title="1. Check the file, 2. confirm"><ImportPanel /></Panel>
      <Panel title="Columns"><ImportColumns /></Panel>
    </div>
  );
}
