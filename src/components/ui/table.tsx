import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type ColumnFiltersState,
  type SortingState,
  type Table,
} from '@tanstack/react-table';
import { useState, type ReactNode } from 'react';
import { Button } from './button';
import { cx } from './cx';

interface ClientTableOptions {
  initialSorting?: SortingState;
  pageSize?: number;
  globalFilter?: string;
  columnFilters?: ColumnFiltersState;
  /** Columns the search box looks in (default: every text column). */
  searchColumns?: string[];
}

/** A table sorted, filtered and paged in the browser (lists here hold at most a few hundred rows). */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- columns of mixed value types
export type Columns<T> = ColumnDef<T, any>[];

export function useClientTable<T>(
  data: T[],
  columns: Columns<T>,
  options: ClientTableOptions = {},
) {
  const [sorting, setSorting] = useState<SortingState>(options.initialSorting ?? []);
  const [pagination, setPagination] = useState({ pageIndex: 0, pageSize: options.pageSize ?? 25 });
  // Back to the first page when the filters change. TanStack's own autoResetPageIndex resets on
  // every new `data` array, which re-rendered the page endlessly and starved route transitions
  // (a click on another screen changed the URL but never showed the screen).
  const filterKey = JSON.stringify([options.globalFilter ?? '', options.columnFilters ?? []]);
  const [seenFilterKey, setSeenFilterKey] = useState(filterKey);
  if (seenFilterKey !== filterKey) {
    setSeenFilterKey(filterKey);
    setPagination((p) => (p.pageIndex === 0 ? p : { ...p, pageIndex: 0 }));
  }
  // eslint-disable-next-line react-hooks/incompatible-library -- TanStack Table returns new functions each render by design
  return useReactTable<T>({
    data,
    columns,
    state: {
      sorting,
      pagination,
      globalFilter: options.globalFilter ?? '',
      columnFilters: options.columnFilters ?? [],
    },
    onSortingChange: setSorting,
    onPaginationChange: setPagination,
    autoResetPageIndex: false,
    globalFilterFn: 'includesString',
    ...(options.searchColumns
      ? { getColumnCanGlobalFilter: (col) => options.searchColumns!.includes(col.id) }
      : {}),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
  });
}

const sortLabel = { asc: 'ascending', desc: 'descending' } as const;

/** Renders a TanStack table: a caption, sortable column headers, rows and paging. */
export function DataTable<T>({
  table,
  caption,
  empty,
}: {
  table: Table<T>;
  caption: string;
  empty?: ReactNode;
}) {
  const rows = table.getRowModel().rows;
  const filteredCount = table.getFilteredRowModel().rows.length;
  const { pageIndex, pageSize } = table.getState().pagination;
  return (
    <div className="flex flex-col gap-3">
      <div className="overflow-x-auto rounded-lg ring-1 ring-dusk-700">
        <table className="w-full border-collapse text-left text-sm sm:text-base">
          <caption className="sr-only">{caption}</caption>
          <thead className="bg-dusk-800 text-dusk-200">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const label = flexRender(header.column.columnDef.header, header.getContext());
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={
                        sorted ? sortLabel[sorted] : header.column.getCanSort() ? 'none' : undefined
                      }
                      className="px-3 py-2 font-medium whitespace-nowrap"
                    >
                      {header.column.getCanSort() ? (
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className="inline-flex items-center gap-1 rounded hover:text-dusk-50"
                        >
                          {label}
                          <span aria-hidden="true" className="text-ember-300">
                            {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                          </span>
                        </button>
                      ) : (
                        label
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr key={row.id} className="border-t border-dusk-700 bg-dusk-850 hover:bg-dusk-800">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2 align-top">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {rows.length === 0 && (
              <tr className="border-t border-dusk-700 bg-dusk-850">
                <td colSpan={table.getAllLeafColumns().length} className="px-3 py-6 text-dusk-300">
                  {empty ?? 'Nothing matches these filters.'}
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
      {filteredCount > pageSize && (
        <nav
          aria-label={`${caption} pages`}
          className="flex flex-wrap items-center justify-between gap-2 text-sm text-dusk-300"
        >
          <span>
            {pageIndex * pageSize + 1}–{Math.min((pageIndex + 1) * pageSize, filteredCount)} of{' '}
            {filteredCount}
          </span>
          <span className="flex gap-2">
            <Button
              size="sm"
              variant="secondary"
              onClick={() => table.previousPage()}
              disabled={!table.getCanPreviousPage()}
            >
              Previous page
            </Button>
            <Button
              size="sm"
              variant="secondary"
              onClick={() => table.nextPage()}
              disabled={!table.getCanNextPage()}
            >
              Next page
            </Button>
          </span>
        </nav>
      )}
    </div>
  );
}

/** A small static table for short lists (no sorting or paging). */
export function SimpleTable({
  caption,
  headers,
  rows,
  className,
}: {
  caption: string;
  headers: ReactNode[];
  rows: ReactNode[][];
  className?: string;
}) {
  return (
    <div className={cx('overflow-x-auto rounded-lg ring-1 ring-dusk-700', className)}>
      <table className="w-full border-collapse text-left text-sm sm:text-base">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-dusk-800 text-dusk-200">
          <tr>
            {headers.map((h, i) => (
              <th key={i} scope="col" className="px-3 py-2 font-medium whitespace-nowrap">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((cells, r) => (
            <tr key={r} className="border-t border-dusk-700 bg-dusk-850">
              {cells.map((cell, c) => (
                <td key={c} className="px-3 py-2 align-top">
                  {cell}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
