import { NumberTable } from "@/components/reports/number-table";
import type { GroupWarranty } from "@/lib/survival/report";
import { groupLabel } from "@/lib/survival/groups";
import { percent } from "@/lib/format";

export function WarrantyTable({ rows, months }: { rows: GroupWarranty[]; months: number }) {
  if (rows.length === 0) return <p className="text-sm text-ink-soft">No repairs with a serial were closed in this selection.</p>;
  return (
    <NumberTable
      caption={`Repairs by cause group and how many came back for the same kind of fault within the ${months}-month warranty`}
      testId="warranty-table"
      rowKey={(r) => r.group}
      rows={rows}
      columns={[
        { key: "group", label: "Repaired fault", cell: (r) => groupLabel(r.group) },
        { key: "repairs", label: "Repairs", numeric: true, cell: (r) => r.repairs },
        { key: "back", label: "Back in warranty", numeric: true, cell: (r) => r.backInWarranty },
        { key: "share", label: `Share back by ${months} months`, numeric: true, cell: (r) => percent(r.shareByWarrantyEnd) },
      ]}
    />
  );
}
