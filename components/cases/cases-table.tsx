"use client";
import { useCallback, useMemo } from "react";
import { useSearchParams } from "next/navigation";
import useSWR from "swr";
import { flexRender, getCoreRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import { EmptyState } from "@/components/ui/empty-state";
import { caseQueryParams, casesKey, DEFAULT_PAGE_SIZE, queryFromParams, type CaseListPage, type CaseTableQuery } from "@/lib/cases/cases-key";
import { fetcher } from "@/lib/fetcher";
import { caseColumns, SORTABLE } from "./case-columns";
import { CaseFilters, type FilterChoices } from "./case-filters";
import { ScrollRegion } from "@/components/ui/scroll-region";

const PAGE_SIZES = [10, 25, 50, 100];

/** The case table: filters, sort and page live in the URL; rows come from GET /api/cases through SWR. */
export function CasesTable({ fallback, fallbackKey, choices }: { fallback: CaseListPage; fallbackKey: string; choices: FilterChoices }) {
  const params = useSearchParams();
  const query = useMemo(() => queryFromParams(new URLSearchParams(params.toString())), [params]);
  const key = casesKey(query);
  const { data, error, isLoading, isValidating } = useSWR<CaseListPage>(key, fetcher, {
    fallbackData: key === fallbackKey ? fallback : undefined,
    keepPreviousData: true,
  });

  // Next keeps useSearchParams in step with history.replaceState, so no server round trip is needed.
  const update = useCallback((patch: Partial<CaseTableQuery>) => {
    const next = { ...queryFromParams(new URLSearchParams(window.location.search)), ...patch };
    if (!("page" in patch)) delete next.page;
    const qs = caseQueryParams(next).toString();
    window.history.replaceState(null, "", qs ? `/cases?${qs}` : "/cases");
  }, []);

  const sorting: SortingState = [{ id: query.sort ?? "createdAt", desc: (query.dir ?? "desc") === "desc" }];
  const limit = query.limit ?? DEFAULT_PAGE_SIZE;
  const page = query.page ?? 1;
  const pageCount = data ? Math.max(1, Math.ceil(data.total / limit)) : 1;

  // The table instance is rebuilt each render on purpose; the React compiler skips this component.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: data?.rows ?? [],
    columns: caseColumns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    pageCount,
    state: { sorting, pagination: { pageIndex: page - 1, pageSize: limit } },
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      const first = next[0];
      update(first ? { sort: first.id, dir: first.desc ? "desc" : "asc" } : { sort: undefined, dir: undefined });
    },
    enableSortingRemoval: false,
  });

  return (
    <div className="flex flex-col gap-4">
      <CaseFilters query={query} choices={choices} onChange={update} />
      {error ? <p role="alert" className="rounded-md bg-danger-light p-3 text-danger">{error instanceof Error ? error.message : "The cases could not be loaded."}</p> : null}
      <ScrollRegion label="Cases" className="overflow-x-auto rounded-lg border border-ink-faint/30 bg-white" aria-busy={isLoading || isValidating}>
        <table className="w-full text-left text-sm" data-testid="cases-table">
          <thead className="bg-paper-deep text-xs uppercase tracking-wide text-ink-soft">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sortable = SORTABLE.has(header.column.id);
                  const dir = header.column.getIsSorted();
                  return (
                    <th key={header.id} scope="col" className="px-3 py-2" aria-sort={dir ? (dir === "asc" ? "ascending" : "descending") : undefined}>
                      {sortable ? (
                        <button type="button" onClick={header.column.getToggleSortingHandler()} className="flex items-center gap-1 uppercase hover:text-ink">
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden="true">{dir === "asc" ? "▲" : dir === "desc" ? "▼" : "↕"}</span>
                        </button>
                      ) : flexRender(header.column.columnDef.header, header.getContext())}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-ink-faint/20">
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} data-testid="case-row" className="hover:bg-paper">
                {row.getVisibleCells().map((cell) => <td key={cell.id} className="px-3 py-2 align-top">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>)}
              </tr>
            ))}
          </tbody>
        </table>
        {data && data.rows.length === 0 ? <div className="p-4"><EmptyState title="No cases match these filters." /></div> : null}
      </ScrollRegion>
      <div className="flex flex-wrap items-center justify-between gap-3 text-sm">
        <p className="text-ink-soft" data-testid="cases-count">{data ? `${data.total} case${data.total === 1 ? "" : "s"} · page ${page} of ${pageCount}` : "Loading…"}</p>
        <div className="flex items-center gap-2">
          <label className="flex items-center gap-2 text-ink-soft">Rows
            <select className="rounded-md border border-ink-faint/50 bg-white px-2 py-1" value={limit} onChange={(e) => update({ limit: Number(e.target.value) })}>
              {PAGE_SIZES.map((n) => <option key={n} value={n}>{n}</option>)}
            </select>
          </label>
          <button type="button" className="rounded-md border border-ink-faint/60 px-3 py-1 disabled:opacity-40" disabled={page <= 1} onClick={() => update({ page: page - 1 })}>Previous</button>
          <button type="button" className="rounded-md border border-ink-faint/60 px-3 py-1 disabled:opacity-40" disabled={page >= pageCount} onClick={() => update({ page: page + 1 })}>Next</button>
        </div>
      </div>
    </div>
  );
}
