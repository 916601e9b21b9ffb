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
      {/* Cell styles are set once on the table: a report table has hundreds of cells, and a class list on each weighs on every page load. */}
      <table data-testid={testId} className={"w-full text-left text-sm [&_td]:py-1.5 [&_td]:pr-3 [&_th]:py-1.5 [&_th]:pr-3 [&_[data-numeric]]:text-right "
        + "[&_td[data-numeric]]:whitespace-nowrap [&_td[data-numeric]]:font-mono [&_td[data-numeric]]:tabular-nums "
        + "[&_tbody_tr]:border-b [&_tbody_tr]:border-ink-faint/15 "
        // A named first column (a tree, a part) keeps a readable width on a phone; the table scrolls instead.
        + "[&_th:first-child:not([data-numeric])]:min-w-40"}>
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-ink-faint/40 text-xs uppercase tracking-wide text-ink-faint">
          <tr>
            {columns.map((c) => <th key={c.key} scope="col" data-numeric={c.numeric || undefined}>{c.label}</th>)}
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={rowKey(r, i)}>
              {columns.map((c) => <td key={c.key} data-numeric={c.numeric || undefined}>{c.cell(r)}</td>)}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
