'use client';

import type { ColumnDef } from '@tanstack/react-table';
import Link from 'next/link';
import { DataTable } from '@/components/ui/data-table';
import type { SiteListResponse } from '@/lib/data/sites';

type Row = SiteListResponse['items'][number];

const columns: ColumnDef<Row, unknown>[] = [
  {
    id: 'name',
    header: 'Site',
    enableSorting: true,
    cell: ({ row }) => (
      <Link href={`/sites/${row.original.id}`} className="font-semibold text-brand-700 hover:underline">
        {row.original.name}
        {row.original.archivedAt && <span className="ml-2 text-xs font-normal text-slate-500">(archived)</span>}
      </Link>
    ),
  },
  {
    id: 'customer',
    header: 'Customer',
    cell: ({ row }) =>
      row.original.customer ? (
        <Link href={`/customers/${row.original.customer.id}`} className="hover:underline">
          {row.original.customer.name}
        </Link>
      ) : (
        '—'
      ),
  },
  { id: 'address', header: 'Street address', cell: ({ row }) => row.original.addressLine },
  { id: 'city', header: 'City', enableSorting: true, cell: ({ row }) => row.original.city },
  { id: 'postalCode', header: 'Postal code', cell: ({ row }) => row.original.postalCode ?? '—' },
];

export function SitesTable({ list, sort, dir }: { list: SiteListResponse; sort: string; dir: 'asc' | 'desc' }) {
  return (
    <DataTable
      caption="Sites"
      columns={columns}
      data={list.items}
      page={list.page}
      pageCount={list.pageCount}
      total={list.total}
      sort={sort}
      dir={dir}
    />
  );
}
