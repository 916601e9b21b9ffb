import Link from "next/link";
import { may, type Capability, type Role } from "@/lib/auth/roles";

export type ReportPageKey = "causes" | "trees" | "parts" | "lasting" | "import";

interface ReportPageLink {
  key: ReportPageKey;
  label: string;
  path: string;
  /** Shares the period and family filter of the pages before it, so the link carries it along. */
  filtered: boolean;
  capability: Capability;
}

/** The reports, one question a page, in the order a shop lead reads them. */
export const REPORT_PAGES: ReportPageLink[] = [
  { key: "causes", label: "Causes", path: "/reports", filtered: true, capability: "reports:read" },
  { key: "trees", label: "Tree accuracy", path: "/reports/trees", filtered: true, capability: "reports:read" },
  { key: "parts", label: "Parts and labour", path: "/reports/parts", filtered: true, capability: "reports:read" },
  { key: "lasting", label: "Does the repair last?", path: "/reports/lasting", filtered: false, capability: "reports:read" },
  { key: "import", label: "Import past repairs", path: "/reports/import", filtered: false, capability: "reports:import" },
];

export const reportPath = (key: ReportPageKey) => REPORT_PAGES.find((p) => p.key === key)!.path;

/** The row of report pages above each one; `query` is the current period and family filter. */
export function ReportsNav({ current, query, role }: { current: ReportPageKey; query: string; role: Role }) {
  return (
    <nav aria-label="Reports" className="flex flex-wrap gap-x-1 gap-y-2 border-b border-ink-faint/40">
      {REPORT_PAGES.filter((page) => may(role, page.capability)).map((page) => {
        const active = page.key === current;
        return (
          <Link key={page.key} href={page.filtered && query ? `${page.path}?${query}` : page.path} aria-current={active ? "page" : undefined}
            className={`-mb-px border-b-2 px-3 py-2 text-sm no-underline hover:no-underline ${active ? "border-copper font-semibold text-ink" : "border-transparent text-ink-soft hover:border-ink-faint hover:text-ink"}`}>
            {page.label}
          </Link>
        );
      })}
    </nav>
  );
}
