import Link from "next/link";
import { createColumnHelper } from "@tanstack/react-table";
import type { CaseListRow, CaseSort } from "@/lib/cases/cases-key";
import { StatusBadge } from "./status-badge";
import { WarrantyFlag } from "@/components/survival/warranty-flag";
import { percent } from "@/lib/format";

const col = createColumnHelper<CaseListRow>();
const day = (iso: string) => iso.slice(0, 10);

/** Column id = the server's sort key where the column can be sorted. */
export const SORTABLE: ReadonlySet<string> = new Set<CaseSort>(["reference", "createdAt", "callerName", "family", "symptom", "status", "technician"]);

export const caseColumns = [
  col.accessor("reference", { id: "reference", header: "Reference", cell: (c) => <Link href={`/cases/${c.row.original.id}`} className="whitespace-nowrap font-mono">{c.getValue()}</Link> }),
  col.accessor("createdAt", { id: "createdAt", header: "Started", cell: (c) => <span className="whitespace-nowrap">{day(c.getValue())}</span> }),
  col.accessor("callerName", { id: "callerName", header: "Caller", cell: (c) => <>{c.getValue()} <span className="text-xs text-ink-faint">{c.row.original.callerKind}</span></> }),
  col.accessor("familyName", { id: "family", header: "Motor family" }),
  col.accessor("symptom", { id: "symptom", header: "Symptom" }),
  col.accessor("status", {
    id: "status", header: "Status",
    cell: (c) => <><StatusBadge status={c.getValue()} /><WarrantyFlag repairReference={c.row.original.warrantyOf} /></>,
  }),
  col.accessor("technicianName", { id: "technician", header: "Technician", cell: (c) => c.getValue() ?? "—" }),
  col.accessor("likelyCause", {
    id: "likely", header: "Likely at triage", enableSorting: false,
    cell: (c) => c.getValue() ? <>{c.getValue()} <span className="whitespace-nowrap text-xs text-ink-faint">{percent(c.row.original.likelyProbability ?? 0)}</span></> : <span className="text-ink-faint">—</span>,
  }),
];
