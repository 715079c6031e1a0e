"use client";

import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from "@tanstack/react-table";
import { useState } from "react";
import { controlClasses } from "./field";
import { cx } from "./cx";

/**
 * A sortable, filterable table on TanStack Table. Columns sort on header click; the search box filters on
 * every column's text. `empty` shows when there are no rows at all, a short line when the filter hides all.
 */
export function DataTable<Row>({
  columns,
  data,
  searchLabel,
  empty,
  initialSort,
  getRowId,
}: {
  columns: ColumnDef<Row, unknown>[];
  data: Row[];
  searchLabel?: string;
  empty?: React.ReactNode;
  initialSort?: SortingState;
  getRowId?: (row: Row) => string;
}) {
  const [sorting, setSorting] = useState<SortingState>(initialSort ?? []);
  const [globalFilter, setGlobalFilter] = useState("");
  const table = useReactTable({
    data,
    columns,
    state: { sorting, globalFilter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setGlobalFilter,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getRowId,
  });

  if (data.length === 0 && empty) return <>{empty}</>;
  const rows = table.getRowModel().rows;
  return (
    <div className="space-y-3">
      {searchLabel && (
        <input
          type="search"
          aria-label={searchLabel}
          placeholder={searchLabel}
          value={globalFilter}
          onChange={(e) => setGlobalFilter(e.target.value)}
          className={cx(controlClasses(false), "h-9 max-w-xs")}
        />
      )}
      <div className="overflow-x-auto rounded-lg border border-line">
        <table className="w-full min-w-[36rem] border-collapse text-left text-sm">
          <thead className="bg-sunken text-xs uppercase tracking-wide text-ink-muted">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const sortable = header.column.getCanSort();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                      className="px-4 py-2.5 font-semibold"
                    >
                      {sortable ? (
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className="inline-flex items-center gap-1 uppercase hover:text-ink"
                        >
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden className="text-[10px]">
                            {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}
                          </span>
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-line bg-surface">
            {rows.map((row) => (
              <tr key={row.id} className="hover:bg-paper">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-4 py-3 align-middle">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {rows.length === 0 && (
              <tr>
                <td colSpan={columns.length} className="px-4 py-6 text-center text-ink-muted">
                  Nothing matches “{globalFilter}”.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </div>
  );
}
