import { ScrollRegion } from "@/components/ui/scroll-region";
/** The numbers behind a chart: a compact table, numeric columns right-aligned. */
export interface Column<R> {
  key: string;
  label: string;
  numeric?: boolean;
  cell: (row: R) => React.ReactNode;
}

export function NumberTable<R>({ caption, columns, rows, rowKey, testId }: {
  caption: string;
  columns: Column<R>[];
  rows: R[];
  rowKey: (row: R, i: number) => string;
  testId?: string;
}) {
  return (
    <ScrollRegion label={caption} className="overflow-x-auto">
      <table className="w-full text-left text-sm" data-testid={testId}>
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-ink-faint/40 text-xs uppercase tracking-wide text-ink-faint">
          <tr>
            {columns.map((c) => <th key={c.key} scope="col" className={`py-1.5 pr-3 ${c.numeric ? "text-right" : ""}`}>{c.label}</th>)}
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={rowKey(r, i)} className="border-b border-ink-faint/15">
              {columns.map((c) => <td key={c.key} className={`py-1.5 pr-3 ${c.numeric ? "whitespace-nowrap text-right font-mono tabular-nums" : ""}`}>{c.cell(r)}</td>)}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
