'use client';

import { useTranslations } from 'next-intl';
import { flexRender, getCoreRowModel, useReactTable, type Cell, type ColumnDef } from '@tanstack/react-table';
import { usePathname, useRouter, useSearchParams } from 'next/navigation';

/**
 * A desk table whose sorting and paging live in the URL (?sort=&dir=&page=) and are done by the server.
 * Columns with `enableSorting` send their id as the sort key.
 */
export function DataTable<Row>({
  columns,
  data,
  page,
  pageCount,
  total,
  sort,
  dir,
  caption,
}: {
  columns: ColumnDef<Row, unknown>[];
  data: Row[];
  page: number;
  pageCount: number;
  total: number;
  sort?: string;
  dir?: 'asc' | 'desc';
  caption: string;
}) {
  const t = useTranslations('common');
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  // eslint-disable-next-line react-hooks/incompatible-library -- the app does not use the React Compiler
  const table = useReactTable({
    data,
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualPagination: true,
    manualSorting: true,
    pageCount,
  });

  const go = (changes: Record<string, string>) => {
    const next = new URLSearchParams(params.toString());
    for (const [key, value] of Object.entries(changes)) next.set(key, value);
    router.push(`${pathname}?${next.toString()}`);
  };

  return (
    <div className="overflow-hidden rounded-lg bg-white ring-1 ring-slate-200">
      <table className="min-w-full text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-slate-100 text-left text-xs uppercase tracking-wide text-slate-600">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sortable = header.column.columnDef.enableSorting;
                const active = sort === header.column.id;
                const ariaSort = active ? (dir === 'asc' ? 'ascending' : 'descending') : undefined;
                return (
                  <th key={header.id} scope="col" aria-sort={ariaSort} className="px-3 py-2 font-semibold">
                    {sortable ? (
                      <button
                        type="button"
                        className="inline-flex items-center gap-1 uppercase hover:text-slate-900"
                        onClick={() =>
                          go({ sort: header.column.id, dir: active && dir === 'asc' ? 'desc' : 'asc', page: '1' })
                        }
                      >
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true">{active ? (dir === 'asc' ? '▲' : '▼') : '↕'}</span>
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
        <tbody className="divide-y divide-slate-100">
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="hover:bg-slate-50">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2 align-top">
                  {cellContent(cell)}
                </td>
              ))}
            </tr>
          ))}
          {data.length === 0 && (
            <tr>
              <td colSpan={columns.length} className="px-3 py-8 text-center text-slate-500">
                Nothing matches.
              </td>
            </tr>
          )}
        </tbody>
      </table>
      <div className="flex items-center justify-between border-t border-slate-200 px-3 py-2 text-sm text-slate-600">
        <span>{t('pageOf', { total, page, pageCount })}</span>
        <div className="flex gap-2">
          <button
            type="button"
            className="rounded px-2 py-1 ring-1 ring-slate-300 disabled:opacity-40"
            disabled={page <= 1}
            onClick={() => go({ page: String(page - 1) })}
          >
            {t('previous')}
          </button>
          <button
            type="button"
            className="rounded px-2 py-1 ring-1 ring-slate-300 disabled:opacity-40"
            disabled={page >= pageCount}
            onClick={() => go({ page: String(page + 1) })}
          >
            {t('next')}
          </button>
        </div>
      </div>
    </div>
  );
}

/** A page of a desk list as the API answers it (`{ items, total, page, pageCount }`) with the URL's sort. */
export type ListTableProps<Row> = {
  list: { items: Row[]; page: number; pageCount: number; total: number };
  sort: string;
  dir: 'asc' | 'desc';
};

/** A DataTable of one page of a desk list. */
export function ListTable<Row>({
  list,
  ...props
}: ListTableProps<Row> & { caption: string; columns: ColumnDef<Row, unknown>[] }) {
  return <DataTable data={list.items} page={list.page} pageCount={list.pageCount} total={list.total} {...props} />;
}

/**
 * A cell's content, its column's function called rather than mounted: flexRender mounts a function as a component,
 * and the tables build their columns on every render, so each render would be a new component type and React
 * would remount the cell, dropping its state (a row action's "… is deactivated" message after router.refresh()).
 */
function cellContent<Row>(cell: Cell<Row, unknown>) {
  const render = cell.column.columnDef.cell;
  return typeof render === 'function' ? render(cell.getContext()) : render;
}
